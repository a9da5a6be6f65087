// What the bench-templates modules share: the page's texts, images of SVG answers, problem display
// and the one number rule (SVG and PDF downloads are common/api.js's postForBlob and download).
import { postJson, showFieldErrors } from '../common/api.js';
import { pageText } from '../common/text.js';
import { parseNumber } from '../common/units.js';
import { hzNumber } from '../common/notes.js';

export const $ = (id) => document.getElementById(id);
export const t = pageText('#tpl-text', 'tpl.js.');

/** A typed number (the one rule of every page: a decimal comma is a point); NaN when empty or no number. */
export const num = (text) => parseNumber(text);

/** A typed pitch that is a number of hertz ("329.63", "329,63 Hz"), else NaN (then it is sent as a note name). */
export const hz = (text) => hzNumber(text);

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

/**
 * Posts a form's request unless the page refused it itself; the problems (the page's or the server's) are shown
 * on the form and its message line. Resolves to the answer's data, or null when refused.
 */
export async function postChecked(form, messageEl, url, { request, problems }) {
  if (problems.length) {
    showProblem(form, messageEl, { errors: problems });
    return null;
  }
  const answer = await postJson(url, request);
  if (!answer.ok) {
    showProblem(form, messageEl, answer.problem);
    return null;
  }
  say(messageEl, '');
  return answer.data;
}

const urls = {};
export function showImage(img, blob, slot) {
  if (urls[slot]) URL.revokeObjectURL(urls[slot]);
  urls[slot] = URL.createObjectURL(blob);
  img.src = urls[slot];
}
