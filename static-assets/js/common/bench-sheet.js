// The bench sheet of the open design: a print layout of the page itself (css: @media print hides
// the navigation and the editing controls, sizes the charts for A4 and Letter) headed by the
// design's name, revision and date and a 100 mm ruler, and the server's PDF of the same design
// (GET /api/v1/designs/{id}/sheet.pdf when saved, POST /api/v1/designs/sheet.pdf when not).
import { format, localTime } from './design-bar.js';
import { csrfHeaders } from './api.js';

const SVG = 'http://www.w3.org/2000/svg';

/** A 100 mm ruler drawn in millimetres (tick every mm, longer every 5 and 10), for checking the print scale. */
export function ruler(label) {
  const svg = document.createElementNS(SVG, 'svg');
  svg.setAttribute('width', '104mm');
  svg.setAttribute('height', '14mm');
  svg.setAttribute('viewBox', '-2 0 104 14');
  svg.setAttribute('class', 'sheet-ruler');
  svg.setAttribute('role', 'img');
  svg.setAttribute('aria-label', label);
  const line = (x1, y1, x2, y2, w) => {
    const l = document.createElementNS(SVG, 'line');
    Object.entries({ x1, y1, x2, y2, stroke: '#000', 'stroke-width': w }).forEach(([k, v]) => l.setAttribute(k, v));
    return l;
  };
  svg.append(line(0, 8, 100, 8, 0.2));
  for (let mm = 0; mm <= 100; mm++) {
    const h = mm % 10 === 0 ? 5 : mm % 5 === 0 ? 3.5 : 2;
    const tick = line(mm, 8, mm, 8 - h, 0.15);
    tick.dataset.mm = String(mm);
    svg.append(tick);
    if (mm % 10 === 0) {
      const t = document.createElementNS(SVG, 'text');
      Object.entries({ x: mm, y: 2.4, 'font-size': 2.2, 'text-anchor': 'middle' }).forEach(([k, v]) => t.setAttribute(k, v));
      t.textContent = String(mm);
      svg.append(t);
    }
  }
  const caption = document.createElementNS(SVG, 'text');
  Object.entries({ x: 0, y: 12, 'font-size': 2.5 }).forEach(([k, v]) => caption.setAttribute(k, v));
  caption.textContent = label;
  svg.append(caption);
  return svg;
}

/**
 * Adds the sheet's buttons to the design bar's actions and keeps the print head filled.
 *   state()  → { id, version, name, kind, savedAt }   the design as the bar knows it
 *   getParameters() → the page's analysis request (for the PDF of an unsaved design)
 */
export function mountBenchSheet(actions, t, { kind, heading, state, getParameters, status }) {
  const main = document.querySelector('main') || document.body;
  let head = document.getElementById('sheet-head');
  if (!head) {
    head = document.createElement('header');
    head.id = 'sheet-head';
    head.className = 'sheet-head';
    main.prepend(head);
  }
  const fill = () => {
    const s = state();
    const name = s.name || t['designbar.sheet.untitled'];
    const h1 = document.createElement('h1');
    h1.textContent = format(t['designbar.sheet.heading'], heading || kind);
    const title = document.createElement('p');
    title.className = 'sheet-name';
    title.textContent = name;
    const line = document.createElement('p');
    line.className = 'sheet-line';
    const revision = s.id == null ? t['designbar.sheet.unsaved'] : format(t['designbar.sheet.revision'], s.version);
    const when = s.id != null && s.savedAt ? format(t['designbar.sheet.savedAt'], localTime(s.savedAt)) : '';
    line.textContent = [revision, when, format(t['designbar.sheet.printed'], new Date().toLocaleString())].filter(Boolean).join(' · ');
    head.replaceChildren(h1, title, line, ruler(t['designbar.sheet.ruler']));
    head.dataset.filled = 'true';
  };
  // Chart.js draws for the screen; before printing every chart is resized to the paper's width.
  const resizeCharts = () => {
    if (!window.Chart) return;
    Object.values(window.Chart.instances || {}).forEach((c) => c.resize());
  };
  window.addEventListener('beforeprint', () => { fill(); resizeCharts(); });
  window.addEventListener('afterprint', resizeCharts);

  const print = document.createElement('button');
  print.type = 'button';
  print.className = 'secondary';
  print.dataset.role = 'print-sheet';
  print.textContent = t['designbar.sheet.print'];
  print.addEventListener('click', () => { fill(); window.print(); });

  const pdf = document.createElement('button');
  pdf.type = 'button';
  pdf.className = 'secondary';
  pdf.dataset.role = 'sheet-pdf';
  pdf.textContent = t['designbar.sheet.pdf'];
  pdf.addEventListener('click', async () => {
    const s = state();
    if (s.id != null) {
      window.open(`/api/v1/designs/${s.id}/sheet.pdf?revision=${s.version}`, '_blank', 'noopener');
      return;
    }
    const response = await fetch('/api/v1/designs/sheet.pdf', {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', Accept: 'application/pdf, application/problem+json', ...csrfHeaders() },
      body: JSON.stringify({ name: s.name || t['designbar.sheet.untitled'], kind, parameters: getParameters() }),
    });
    if (!response.ok) {
      const problem = await response.json().catch(() => ({}));
      const why = (problem.errors ?? []).map((e) => `${e.field}: ${e.message}`).join('; ') || problem.detail || String(response.status);
      status(format(t['designbar.sheet.failed'], why), 'error');
      return;
    }
    const url = URL.createObjectURL(await response.blob());
    window.open(url, '_blank', 'noopener');
    setTimeout(() => URL.revokeObjectURL(url), 60000);
  });
  actions.append(print, pdf);
  fill();
  return { fill };
}
