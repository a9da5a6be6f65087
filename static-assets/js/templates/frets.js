// Fret slotting template: SVG preview, SVG and tiled PDF downloads.
import { clearFieldErrors, postForBlob, download } from '../common/api.js';
import { $, t, num, showProblem, say, showImage } from './shared.js';

const fretForm = $('fret-form');

function fretRequest() {
  const problems = [];
  const field = (id, name, integer) => {
    const v = num($(id).value);
    if (!Number.isFinite(v)) problems.push({ field: name, message: t('notNumber') });
    else if (integer && !Number.isInteger(v)) problems.push({ field: name, message: t('notWhole', v) });
    return Number.isFinite(v) ? v : null;
  };
  const request = {
    scaleLengthMm: field('fret-scale', 'scaleLengthMm'),
    count: field('fret-count', 'count', true),
    divisionsPerOctave: field('fret-divisions', 'divisionsPerOctave', true),
    lineLengthMm: field('fret-line', 'lineLengthMm'),
    positions: [],
  };
  $('fret-positions').value.split('\n').forEach((line, i) => {
    if (!line.trim()) return;
    const eq = line.lastIndexOf('=');
    const mm = eq > 0 ? num(line.slice(eq + 1)) : NaN;
    if (eq <= 0 || !Number.isFinite(mm)) {
      problems.push({ field: 'positions', message: t('badLine', i + 1) });
      return;
    }
    request.positions.push({ label: line.slice(0, eq).trim(), positionMm: mm });
  });
  return { request, problems };
}

async function fretTemplate(kind) {
  clearFieldErrors(fretForm);
  const { request, problems } = fretRequest();
  if (problems.length) {
    showProblem(fretForm, $('fret-message'), { errors: problems });
    return;
  }
  const paper = $('fret-paper').value;
  const url = kind === 'pdf' ? `/api/v1/templates/frets.pdf?paper=${encodeURIComponent(paper)}` : '/api/v1/templates/frets.svg';
  const answer = await postForBlob(url, request);
  if (!answer.ok) {
    showProblem(fretForm, $('fret-message'), answer.problem);
    return;
  }
  const stem = `frets-${request.scaleLengthMm}mm-${request.count}`;
  if (kind === 'preview') {
    showImage($('fret-image'), answer.blob, 'fret');
    say($('fret-message'), '');
  } else {
    const name = kind === 'pdf' ? `${stem}-${paper}.pdf` : `${stem}.svg`;
    download(answer.blob, name);
    say($('fret-message'), t('downloaded', name));
  }
}

fretForm.addEventListener('submit', (e) => { e.preventDefault(); fretTemplate('preview'); });
$('fret-svg').addEventListener('click', () => fretTemplate('svg'));
$('fret-pdf').addEventListener('click', () => fretTemplate('pdf'));

