// Small fetch helpers shared by every page: JSON in and out, CSRF header when the server
// asks for one (LAN mode), problem documents turned into per-field messages.

export function csrfHeaders() {
  const token = document.querySelector('meta[name="_csrf"]');
  const header = document.querySelector('meta[name="_csrf_header"]');
  return token && header ? { [header.content]: token.content } : {};
}

/** Sends a request with a JSON body; resolves to {ok, status, data, problem}. */
export async function sendJson(method, url, body) {
  const response = await fetch(url, {
    method,
    headers: { 'Content-Type': 'application/json', Accept: 'application/json, application/problem+json', ...csrfHeaders() },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  return readResponse(response);
}

export const postJson = (url, body) => sendJson('POST', url, body);

export async function getJson(url) {
  const response = await fetch(url, { headers: { Accept: 'application/json, application/problem+json' } });
  return readResponse(response);
}

/** Posts a FormData (multipart) body; resolves like sendJson. */
export async function postForm(url, formData) {
  const response = await fetch(url, { method: 'POST', headers: { ...csrfHeaders() }, body: formData });
  return readResponse(response);
}

async function readResponse(response) {
  const type = response.headers.get('Content-Type') || '';
  let data = null;
  if (type.includes('json')) {
    data = await response.json();
  } else if (response.status !== 204) {
    data = await response.text();
  }
  if (response.ok) {
    return { ok: true, status: response.status, data, problem: null };
  }
  return { ok: false, status: response.status, data: null, problem: data };
}

/** POSTs JSON and resolves to {ok, blob, problem}: for SVG and PDF answers. */
export async function postForBlob(url, body) {
  const response = await fetch(url, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', Accept: '*/*', ...csrfHeaders() },
    body: JSON.stringify(body),
  });
  if (response.ok) return { ok: true, blob: await response.blob(), problem: null };
  const type = response.headers.get('Content-Type') || '';
  return { ok: false, blob: null, problem: type.includes('json') ? await response.json() : { detail: response.statusText } };
}

/** Saves a blob (an SVG or PDF answer) as a download named {@code name}. */
export function download(blob, name) {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10000);
}

/**
 * One line for a refused request: its first field problem as "field: message", else its detail, else the fallback.
 */
export function problemLine(problem, fallback = '') {
  const first = (problem?.errors ?? [])[0];
  return first ? `${first.field}: ${first.message}` : (problem?.detail ?? fallback);
}

/** Field messages of a problem document as a Map from dotted field path to message. */
export function fieldErrors(problem) {
  const map = new Map();
  if (problem && Array.isArray(problem.errors)) {
    for (const e of problem.errors) {
      map.set(e.field, map.has(e.field) ? `${map.get(e.field)}; ${e.message}` : e.message);
    }
  }
  return map;
}

/**
 * Marks inputs of a container invalid from a problem document. Inputs name their field with
 * data-field="dotted.path"; a message goes in the element with data-error-for="dotted.path"
 * (created after the input when missing). Returns the messages no input claimed.
 */
export function showFieldErrors(container, problem) {
  clearFieldErrors(container);
  const unclaimed = [];
  for (const [field, message] of fieldErrors(problem)) {
    const input = container.querySelector(`[data-field="${CSS.escape(field)}"]`);
    if (!input) {
      unclaimed.push(`${field}: ${message}`);
      continue;
    }
    input.classList.add('invalid');
    input.setAttribute('aria-invalid', 'true');
    let slot = container.querySelector(`[data-error-for="${CSS.escape(field)}"]`);
    if (!slot) {
      slot = document.createElement('span');
      slot.className = 'field-error';
      slot.dataset.errorFor = field;
      slot.dataset.generated = 'true';
      input.insertAdjacentElement('afterend', slot);
    }
    slot.textContent = message;
  }
  return unclaimed;
}

export function clearFieldErrors(container) {
  container.querySelectorAll('.invalid').forEach((el) => { el.classList.remove('invalid'); el.removeAttribute('aria-invalid'); });
  container.querySelectorAll('[data-error-for]').forEach((el) => {
    if (el.dataset.generated) el.remove(); else el.textContent = '';
  });
}

/** Escapes text for safe insertion into HTML (prefer textContent where possible). */
export function escapeHtml(text) {
  return String(text).replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' }[c]));
}
