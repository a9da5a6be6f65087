// Two designs of one kind (or two revisions of one design) compared the way a maker reads them:
// the parameters labelled in the user's units, and the results each bench's analysis endpoint
// answers for both, side by side with their difference (tension, stress share, B, each partial's
// cents from the harmonic series and the pluck × pickup levels; the resonances' and fingerings'
// cents of a bore; the modes of a bar or plate), with charts of those differences. Every derived
// figure is the server's; the page only subtracts two of them, or takes the cents between two
// frequencies with common/notes.js. The pure parts (parameterRows, sections) touch no DOM.
import { cents } from '../common/notes.js';
import { PALETTE, INK, translucent } from '../common/charts.js';
import { LENGTH_UNITS, FORCE_UNITS, fromMm, fromNewton } from '../common/units.js';

export const ANALYZE = { string: '/api/v1/strings/analyze', 'string-set': '/api/v1/string-sets/analyze',
  'air-column': '/api/v1/air-columns/analyze', bar: '/api/v1/bars/analyze', plate: '/api/v1/plates/analyze' };

/** Six significant digits at most, no float noise. */
export function num(v, digits = 6) {
  if (v === null || v === undefined || !Number.isFinite(v)) return '';
  return String(Number(v.toPrecision(digits)));
}

const signed = (v, digits = 2) => (v === null || v === undefined || !Number.isFinite(v) ? '' : `${v > 0 ? '+' : ''}${v.toFixed(digits)}`);

/**
 * How a parameter's JSON name carries its unit (the contract's suffixes) and how it is shown:
 * lengths and forces in the user's units, the rest in the units a maker reads.
 */
export function quantityOf(key) {
  if (/Mm$/.test(key)) return 'length';
  if (/N$/.test(key) && !/[A-Z]N$/.test(key)) return 'force';
  if (/KgPerM3$/.test(key)) return 'density';
  if (/KgPerM$/.test(key)) return 'linear-density';
  if (/Pa$/.test(key)) return 'modulus';
  if (/Hz$/.test(key)) return 'frequency';
  if (/Pct$/.test(key)) return 'percent';
  if (/C$/.test(key) && /temperature/i.test(key)) return 'temperature';
  return null;
}

const LENGTH_WORD = { mm: 'mm', inch: 'in' };

/** The unit word shown for a quantity, in the user's units. */
export function unitWord(quantity, units) {
  switch (quantity) {
    case 'length': return LENGTH_WORD[units.length] ?? 'mm';
    case 'force': return units.force;
    case 'density': return 'kg/m³';
    case 'linear-density': return 'g/m';
    case 'modulus': return 'GPa';
    case 'frequency': return 'Hz';
    case 'percent': return '%';
    case 'temperature': return '°C';
    default: return '';
  }
}

/** A value of the request (mm, N, Pa, kg/m …) in the unit shown. */
export function inUnit(quantity, value, units) {
  if (typeof value !== 'number') return value;
  switch (quantity) {
    case 'length': return fromMm(value, units.length);
    case 'force': return fromNewton(value, units.force);
    case 'linear-density': return value * 1000;
    case 'modulus': return value / 1e9;
    default: return value;
  }
}

/** Flattens a request to dotted paths; arrays of plain values (closed holes) stay one value. */
export function flatten(node, path = '', out = {}) {
  const plainArray = Array.isArray(node) && node.every((x) => x === null || typeof x !== 'object');
  if (node !== null && typeof node === 'object' && !plainArray && Object.keys(node).length > 0) {
    for (const [k, v] of Object.entries(node)) {
      flatten(v, Array.isArray(node) ? `${path}[${k}]` : (path ? `${path}.${k}` : k), out);
    }
  } else if (path) {
    out[path] = node;
  }
  return out;
}

/** "lengthMm" → "length", "relativeHumidityPct" → "relative humidity": the words of a name without its unit. */
function humane(key) {
  const bare = key.replace(/(Mm|N|Hz|Pa|KgPerM3|KgPerM|Pct)$/, '').replace(/C$/, (c) => (/temperature/i.test(key) ? '' : c));
  return bare.replace(/([a-z0-9])([A-Z])/g, '$1 $2').toLowerCase();
}

/**
 * The label of a parameter path: each part's word from the texts (library.param.<name>), numbered
 * from 1 for the members of a list ("pickups[0].positionMm" → "Pickup 1 · position").
 */
export function labelOf(path, words = {}) {
  return path.split('.').map((part) => {
    const m = /^([^[]+)((?:\[\d+\])*)$/.exec(part);
    const name = m ? m[1] : part;
    const indexes = m ? [...m[2].matchAll(/\[(\d+)\]/g)].map((x) => Number(x[1]) + 1) : [];
    const word = words[`library.param.${name}`] ?? humane(name);
    return [word, ...indexes].join(' ');
  }).join(' · ');
}

/** The value of a parameter as shown: a number in the unit, a list joined, a word as it is. */
function shown(value, quantity, units) {
  if (value === undefined) return '—';
  if (value === null) return '';
  if (Array.isArray(value)) return value.join(', ');
  if (typeof value === 'number') return num(inUnit(quantity, value, units));
  return String(value);
}

/**
 * The parameter table: one row per path of either side, labelled, in the user's units, marked where
 * the server's comparison found a difference (a path, or one inside a list value).
 */
export function parameterRows(leftParameters, rightParameters, differences, units, words = {}) {
  const a = flatten(leftParameters ?? {});
  const b = flatten(rightParameters ?? {});
  const differ = (path) => differences.some((d) => d.path === path || d.path.startsWith(`${path}[`) || d.path.startsWith(`${path}.`));
  return [...new Set([...Object.keys(a), ...Object.keys(b)])].map((path) => {
    const key = path.replace(/\[\d+\]$/, '').split('.').pop().replace(/\[\d+\]/g, '');
    const quantity = quantityOf(key);
    const unit = unitWord(quantity, units);
    let change = '';
    if (typeof a[path] === 'number' && typeof b[path] === 'number') {
      const d = inUnit(quantity, b[path], units) - inUnit(quantity, a[path], units);
      change = d === 0 ? '' : `${d > 0 ? '+' : ''}${num(d)}`;
    }
    return { path, label: labelOf(path, words), unit, a: shown(a[path], quantity, units), b: shown(b[path], quantity, units),
      change, differs: differ(path) };
  });
}

/** dB of a pickup's output (20·log10 of the amplitude the server gives), null for none or zero. */
const db = (x) => (x === null || x === undefined || x === 0 || !Number.isFinite(x) ? null : 20 * Math.log10(Math.abs(x)));

/** The level of partial m as heard: pluck × pickups combined, else × the first pickup, else the pluck alone. */
function level(m) {
  if (m.combinedOutput !== null && m.combinedOutput !== undefined) return m.combinedOutput;
  if (m.pickupOutput?.length) return m.pickupOutput[0];
  return m.excitation;
}

function levelWord(r, t) {
  const m = r?.modes?.[0];
  if (!m) return '';
  if (m.combinedOutput !== null && m.combinedOutput !== undefined) return t('library.compare.level.combined');
  if (m.pickupOutput?.length) return t('library.compare.level.pickup');
  return t('library.compare.level.pluck');
}

/** Rows matched by key from two lists (a member missing on one side stays empty there). */
function matched(listA, listB, key) {
  const byKey = new Map();
  for (const x of listA ?? []) byKey.set(key(x), { a: x, b: null });
  for (const x of listB ?? []) {
    const k = key(x);
    byKey.set(k, { a: byKey.get(k)?.a ?? null, b: x });
  }
  return [...byKey.entries()].map(([k, v]) => ({ key: k, ...v }));
}

const diff = (a, b) => (Number.isFinite(a) && Number.isFinite(b) ? b - a : null);
const centsDiff = (fa, fb) => (fa > 0 && fb > 0 ? cents(fb, fa) : null);

/**
 * The derived results of both designs, as sections {id, title, rows: [{id, label, unit, a, b,
 * difference, differenceUnit}], chart?: {axis, values: 'both' | 'difference'}}; values are numbers
 * (null where a side has none), formatted by the page. ra and rb are the analysis answers.
 */
export function sections(kind, ra, rb, units, t = (k) => k) {
  const force = unitWord('force', units);
  const out = [];
  if (kind === 'string') {
    out.push({ id: 'summary', title: t('library.compare.results'), rows: [
      { id: 'f1', label: t('library.compare.f1'), unit: 'Hz', a: ra?.fundamentalHz, b: rb?.fundamentalHz,
        difference: centsDiff(ra?.fundamentalHz, rb?.fundamentalHz), differenceUnit: 'cents',
        noteA: ra?.note, noteB: rb?.note },
      { id: 'tension', label: t('library.compare.tension'), unit: force, a: inUnit('force', ra?.tensionN, units),
        b: inUnit('force', rb?.tensionN, units), difference: diff(inUnit('force', ra?.tensionN, units), inUnit('force', rb?.tensionN, units)), differenceUnit: force },
      { id: 'stress', label: t('library.compare.stressShare'), unit: '%', a: pct(ra?.stressFraction), b: pct(rb?.stressFraction),
        difference: diff(pct(ra?.stressFraction), pct(rb?.stressFraction)), differenceUnit: '%' },
      { id: 'b', label: t('library.compare.b'), unit: '', a: ra?.inharmonicityB, b: rb?.inharmonicityB,
        difference: diff(ra?.inharmonicityB, rb?.inharmonicityB), differenceUnit: '', ratio: true },
      { id: 'mu', label: t('library.compare.linearDensity'), unit: 'g/m', a: milli(ra?.linearDensityKgPerM), b: milli(rb?.linearDensityKgPerM),
        difference: diff(milli(ra?.linearDensityKgPerM), milli(rb?.linearDensityKgPerM)), differenceUnit: 'g/m' },
    ] });
    const partials = matched(ra?.modes, rb?.modes, (m) => m.n);
    out.push({ id: 'partials', title: t('library.compare.partialCents'), axis: t('library.compare.centsAxis'), chart: 'both',
      rows: partials.map(({ key, a, b }) => ({ id: `partial-${key}`, label: String(key), unit: 'cents',
        a: a?.centsFromHarmonic ?? null, b: b?.centsFromHarmonic ?? null, difference: diff(a?.centsFromHarmonic, b?.centsFromHarmonic), differenceUnit: 'cents' })) });
    out.push({ id: 'levels', title: `${t('library.compare.levels')} (${levelWord(ra, t)} · ${levelWord(rb, t)})`, axis: 'dB', chart: 'both',
      rows: partials.map(({ key, a, b }) => {
        const la = a ? db(level(a)) : null;
        const lb = b ? db(level(b)) : null;
        return { id: `level-${key}`, label: String(key), unit: 'dB', a: la, b: lb, difference: diff(la, lb), differenceUnit: 'dB' };
      }) });
  } else if (kind === 'string-set') {
    out.push({ id: 'summary', title: t('library.compare.results'), rows: [
      { id: 'total', label: t('library.compare.totalTension'), unit: force, a: inUnit('force', ra?.totalTensionN, units), b: inUnit('force', rb?.totalTensionN, units),
        difference: diff(inUnit('force', ra?.totalTensionN, units), inUnit('force', rb?.totalTensionN, units)), differenceUnit: force }] });
    const strings = matched(ra?.strings, rb?.strings, (s) => s.index);
    out.push({ id: 'tensions', title: t('library.compare.tensions'), axis: force, chart: 'both',
      rows: strings.map(({ key, a, b }) => ({ id: `string-${key}`, label: (a ?? b).label || String(key + 1), unit: force,
        a: inUnit('force', a?.tensionN, units) ?? null, b: inUnit('force', b?.tensionN, units) ?? null,
        difference: diff(inUnit('force', a?.tensionN, units), inUnit('force', b?.tensionN, units)), differenceUnit: force })) });
    out.push({ id: 'stress', title: t('library.compare.stressShares'), axis: '%', chart: 'both',
      rows: strings.map(({ key, a, b }) => ({ id: `stress-${key}`, label: (a ?? b).label || String(key + 1), unit: '%',
        a: pct(a?.stressFraction), b: pct(b?.stressFraction), difference: diff(pct(a?.stressFraction), pct(b?.stressFraction)), differenceUnit: '%' })) });
  } else if (kind === 'air-column') {
    const res = matched(ra?.resonances, rb?.resonances, (r) => r.n);
    out.push({ id: 'resonances', title: t('library.compare.resonances'), axis: t('library.compare.centsAxis'), chart: 'difference',
      rows: res.map(({ key, a, b }) => ({ id: `resonance-${key}`, label: String(key), unit: 'Hz', a: a?.frequencyHz ?? null, b: b?.frequencyHz ?? null,
        difference: centsDiff(a?.frequencyHz, b?.frequencyHz), differenceUnit: 'cents' })) });
    out.push({ id: 'series', title: t('library.compare.seriesCents'), axis: t('library.compare.centsAxis'), chart: 'both',
      rows: res.map(({ key, a, b }) => ({ id: `series-${key}`, label: String(key), unit: 'cents', a: a?.centsFromSeries ?? null, b: b?.centsFromSeries ?? null,
        difference: diff(a?.centsFromSeries, b?.centsFromSeries), differenceUnit: 'cents' })) });
    const fingerings = matched(ra?.fingerings, rb?.fingerings, (f) => f.name || String(f.index));
    if (fingerings.length) {
      out.push({ id: 'fingerings', title: t('library.compare.fingerings'), axis: t('library.compare.centsAxis'), chart: 'both',
        rows: fingerings.map(({ key, a, b }) => ({ id: `fingering-${key}`, label: key, unit: 'cents',
          a: a?.centsFromTarget ?? null, b: b?.centsFromTarget ?? null, difference: diff(a?.centsFromTarget, b?.centsFromTarget), differenceUnit: 'cents' })) });
    }
  } else if (kind === 'bar' || kind === 'plate') {
    const key = kind === 'plate' ? (m) => m.name || String(m.n) : (m) => `${m.kind ?? ''} ${m.n}`.trim();
    const modes = matched(ra?.modes, rb?.modes, key);
    const f1a = ra?.modes?.[0]?.frequencyHz;
    const f1b = rb?.modes?.[0]?.frequencyHz;
    const ratio = (m, f1) => (kind === 'bar' ? m?.ratioToFirst : (m && f1 ? m.frequencyHz / f1 : null));
    out.push({ id: 'modes', title: t('library.compare.modes'), axis: t('library.compare.centsAxis'), chart: 'difference',
      rows: modes.map(({ key: k, a, b }) => ({ id: `mode-${k}`, label: k, unit: 'Hz', a: a?.frequencyHz ?? null, b: b?.frequencyHz ?? null,
        difference: centsDiff(a?.frequencyHz, b?.frequencyHz), differenceUnit: 'cents' })) });
    out.push({ id: 'ratios', title: t('library.compare.ratios'), axis: t('library.compare.centsAxis'), chart: 'difference',
      rows: modes.map(({ key: k, a, b }) => ({ id: `ratio-${k}`, label: k, unit: '', a: ratio(a, f1a), b: ratio(b, f1b),
        difference: centsDiff(ratio(a, f1a), ratio(b, f1b)), differenceUnit: 'cents' })) });
    out.push({ id: 'notes', title: t('library.compare.noteCents'), axis: t('library.compare.centsAxis'), chart: 'both',
      rows: modes.map(({ key: k, a, b }) => ({ id: `note-${k}`, label: k, unit: 'cents', a: a?.note?.centsOff ?? null, b: b?.note?.centsOff ?? null,
        difference: diff(a?.note?.centsOff, b?.note?.centsOff), differenceUnit: 'cents', noteA: a?.note, noteB: b?.note })) });
  }
  return out;
}

function pct(fraction) { return Number.isFinite(fraction) ? fraction * 100 : null; }
function milli(x) { return Number.isFinite(x) ? x * 1000 : null; }

/** The units the user last chose: the compare page's own choice, else the bench's of this kind. */
export function rememberedUnits(kind, storage) {
  const read = (key) => { try { return JSON.parse(storage?.getItem(key) || 'null'); } catch (e) { return null; } };
  const bench = kind === 'string-set' ? 'string-sets' : 'strings';
  const u = { ...(read(`nodewright.units.${bench}`) ?? {}), ...(read('nodewright.units.library') ?? {}) };
  return { length: u.length in LENGTH_UNITS ? u.length : 'mm', force: u.force in FORCE_UNITS ? u.force : 'N' };
}

/** A value of a result row as shown. */
export function formatValue(v, unit) {
  if (v === null || v === undefined || !Number.isFinite(v)) return '—';
  if (unit === 'cents' || unit === 'dB' || unit === '%') return v.toFixed(2);
  return num(v, 6);
}

/** A difference as shown: signed, cents and dB to 0.01, B as a difference and a ratio. */
export function formatDifference(row) {
  const d = row.difference;
  if (d === null || d === undefined || !Number.isFinite(d)) return '—';
  if (row.ratio) return `${d > 0 ? '+' : ''}${num(d, 4)} (×${num(row.b / row.a, 4)})`;
  if (['cents', 'dB', '%'].includes(row.differenceUnit)) return `${signed(d, 2)} ${row.differenceUnit}`;
  return `${d > 0 ? '+' : ''}${num(d, 5)} ${row.differenceUnit}`.trim();
}

// ---------- the page (called by library-page.js; touches the DOM only when called) ----------

function el(tag, attrs = {}, text) {
  const e = document.createElement(tag);
  for (const [k, v] of Object.entries(attrs)) e.setAttribute(k, v);
  if (text !== undefined && text !== null) e.textContent = text;
  return e;
}

const COLOURS = { a: PALETTE[0], b: PALETTE[1], difference: INK };   // the page palette (Okabe–Ito) and the ink

/** Draws one section's table and, where it has one, its chart of the differences. */
function renderSection(holder, s, names, t) {
  const box = el('section', { class: 'panel compare-section', 'data-section': s.id });
  box.append(el('h2', {}, s.title));
  const table = el('table', { class: 'numbers compare-results', id: `results-${s.id}` });
  const head = el('tr');
  head.append(el('th', { scope: 'col' }, t(`library.compare.col.${s.id}`) || ''), el('th', { scope: 'col' }, t('library.compare.unit')),
    el('th', { scope: 'col' }, names[0]), el('th', { scope: 'col' }, names[1]), el('th', { scope: 'col' }, t('library.compare.difference')));
  table.append(el('thead'), el('tbody'));
  table.tHead.append(head);
  for (const r of s.rows) {
    const tr = el('tr', { 'data-row': r.id });
    if (r.difference !== null && r.difference !== undefined && Math.abs(r.difference) > 0) tr.classList.add('differs');
    const side = (v, note, which) => {
      const td = el('td', { 'data-side': which, 'data-value': v === null || v === undefined ? '' : String(v) }, formatValue(v, r.unit));
      if (note?.name) td.append(el('span', { class: 'note' }, ` ${note.name} ${signed(note.centsOff, 1)}`));
      return td;
    };
    tr.append(el('th', { scope: 'row' }, r.label), el('td', { class: 'unit' }, r.unit),
      side(r.a, r.noteA, 'a'), side(r.b, r.noteB, 'b'),
      el('td', { 'data-side': 'difference', 'data-value': r.difference === null || r.difference === undefined ? '' : String(r.difference) }, formatDifference(r)));
    table.tBodies[0].append(tr);
  }
  const wrap = el('div', { class: 'table-wrap' });
  wrap.append(table);
  box.append(wrap);
  if (s.chart && s.rows.length) {
    const chartBox = el('div', { class: 'chart-box' });
    const canvas = el('canvas', { id: `compare-chart-${s.id}`, role: 'img', 'aria-label': `${s.title}: ${t('library.compare.chartAlt')}` });
    chartBox.append(canvas);
    box.append(chartBox);
    holder.append(box);
    const labels = s.rows.map((r) => r.label);
    const datasets = [];
    if (s.chart === 'both') {
      datasets.push(...['a', 'b'].map((k, i) => ({ kind: k, type: 'line', label: names[i], data: s.rows.map((r) => r[k] ?? null),
        borderColor: COLOURS[k], backgroundColor: COLOURS[k], pointStyle: k === 'a' ? 'circle' : 'triangle', pointRadius: 4, yAxisID: 'y', order: 1 })));
    }
    datasets.push({ kind: 'difference', type: 'bar', label: `${t('library.compare.difference')} (${s.rows[0].differenceUnit})`,
      data: s.rows.map((r) => r.difference ?? null), backgroundColor: translucent(INK, 0.45), borderColor: COLOURS.difference, borderWidth: 1,
      yAxisID: s.chart === 'both' ? 'y2' : 'y', order: 2 });
    const scales = { x: { title: { display: true, text: t(`library.compare.col.${s.id}`) || '' } },
      y: { title: { display: true, text: s.chart === 'both' ? s.axis : `${t('library.compare.difference')} (${s.rows[0].differenceUnit})` } } };
    if (s.chart === 'both') scales.y2 = { position: 'right', grid: { drawOnChartArea: false }, title: { display: true, text: `${t('library.compare.difference')} (${s.rows[0].differenceUnit})` } };
    // eslint-disable-next-line no-undef
    new Chart(canvas, { type: 'bar', data: { labels, datasets }, options: { responsive: true, maintainAspectRatio: false, animation: false, scales } });
  } else {
    holder.append(box);
  }
}

/**
 * The compare page: ?a=ID&b=ID (two designs, each at its current version or ?aVersion/?bVersion),
 * or ?design=ID&from=V&to=V (two revisions of one design). t(key) reads library texts.
 */
export async function showCompare({ getJson, postJson, t, status, problemText }) {
  const q = new URLSearchParams(window.location.search);
  const url = q.has('design')
    ? `/api/v1/designs/${encodeURIComponent(q.get('design'))}/revisions/compare?from=${encodeURIComponent(q.get('from') ?? '')}&to=${encodeURIComponent(q.get('to') ?? '')}`
    : `/api/v1/designs/compare?${q}`;
  const r = await getJson(url);
  if (!r.ok) { status(problemText(r), 'error'); return; }
  const { left, right, differences } = r.data;
  const names = [`A: ${left.name} (v${left.version})`, `B: ${right.name} (v${right.version})`];
  document.getElementById('compare-left-name').textContent = names[0];
  document.getElementById('compare-right-name').textContent = names[1];
  document.getElementById('compare-summary').textContent = differences.length
    ? t('library.compare.differ').replace('{0}', differences.length) : t('library.compare.same');
  const lengthSelect = document.getElementById('length-unit');
  const forceSelect = document.getElementById('force-unit');
  const units = rememberedUnits(left.kind, window.localStorage);
  lengthSelect.value = units.length;
  forceSelect.value = units.force;

  const results = await Promise.all([left, right].map((s) => postJson(ANALYZE[s.kind], s.parameters)));
  const note = document.getElementById('compare-chart-note');
  if (results.some((x) => !x.ok)) {
    note.hidden = false;
    note.textContent = results.map((x) => (x.ok ? '' : problemText(x))).filter(Boolean).join(' | ') || t('library.compare.noAnalysis');
  }

  function draw() {
    const u = { length: lengthSelect.value, force: forceSelect.value };
    const tbody = document.querySelector('#compare-table tbody');
    tbody.replaceChildren();
    for (const row of parameterRows(left.parameters, right.parameters, differences, u, wordsOf(t))) {
      const tr = el('tr', { 'data-path': row.path });
      if (row.differs) tr.classList.add('differs');
      tr.append(el('th', { scope: 'row' }, row.label), el('td', { class: 'unit' }, row.unit), el('td', { 'data-side': 'a' }, row.a),
        el('td', { 'data-side': 'b' }, row.b), el('td', { 'data-side': 'difference' }, row.change));
      tbody.append(tr);
    }
    const holder = document.getElementById('compare-results');
    holder.querySelectorAll('canvas').forEach((c) => Chart.getChart(c)?.destroy()); // eslint-disable-line no-undef
    holder.replaceChildren();
    const [ra, rb] = results.map((x) => (x.ok ? x.data : null));
    for (const s of sections(left.kind, ra, rb, u, t)) renderSection(holder, s, names, t);
  }
  const changed = () => {
    window.localStorage.setItem('nodewright.units.library', JSON.stringify({ length: lengthSelect.value, force: forceSelect.value }));
    draw();
  };
  lengthSelect.addEventListener('change', changed);
  forceSelect.addEventListener('change', changed);
  draw();
}

/** The parameter words of the texts, for labelOf. */
function wordsOf(t) {
  return new Proxy({}, { get: (_, key) => t(key) || undefined });
}
