// What the bench-templates modules share: the page's texts, downloads of SVG and PDF answers,
// problem display and the one number rule.
import { csrfHeaders, showFieldErrors } from '../common/api.js';
import { pageText } from '../common/text.js';
import { parseNumber } from '../common/units.js';
import { hzNumber } from '../common/notes.js';

export const $ = (id) => document.getElementById(id);
export const t = pageText('#tpl-text', 'tpl.js.');

/** A typed number (the one rule of every page: a decimal comma is a point); NaN when empty or no number. */
export const num = (text) => parseNumber(text);

/** A typed pitch that is a number of hertz ("329.63", "329,63 Hz"), else NaN (then it is sent as a note name). */
export const hz = (text) => hzNumber(text);

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

export function showProblem(container, messageEl, problem) {
  const unclaimed = showFieldErrors(container, problem);
  const detail = problem && problem.detail ? problem.detail : '';
  messageEl.textContent = [detail, ...unclaimed].filter(Boolean).join(' ');
  messageEl.classList.add('bad');
}

export function say(messageEl, text) {
  messageEl.textContent = text;
  messageEl.classList.remove('bad');
}

const urls = {};
export function showImage(img, blob, slot) {
  if (urls[slot]) URL.revokeObjectURL(urls[slot]);
  urls[slot] = URL.createObjectURL(blob);
  img.src = urls[slot];
}

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
