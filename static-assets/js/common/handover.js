// Hand-overs between pages of one browser tab (sessionStorage): a page opens another with values
// to start from, unsaved. Each key names what it carries.

/** A bore ({request}) for the bore bench, from the bench templates' solver. */
export const OPEN_AIR_COLUMN = 'nodewright.openAirColumn';
/** A bore ({request}) for the bench templates, from the bore bench. */
export const BORE_FOR_TEMPLATES = 'nodewright.boreForTemplates';
/** Part of a string request (a measured fit with its tension, length and core) for the string bench. */
export const APPLY_STRING_PARAMETERS = 'nodewright.applyStringParameters';

export function handOver(key, value) {
  sessionStorage.setItem(key, JSON.stringify(value));
}

/** What was handed over under key (JSON), or null; with take, it is removed. Throws on unreadable JSON. */
export function handedOver(key, { take = false } = {}) {
  const text = sessionStorage.getItem(key);
  if (text === null) return null;
  if (take) sessionStorage.removeItem(key);
  return JSON.parse(text);
}
