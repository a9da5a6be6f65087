// User-facing texts of the bore bench script: rendered by the page from
// messages/aircolumns.properties (keys air.js.*) into <div id="air-text">, read by the one text lookup.
import { pageText } from '../common/text.js';

/** The text for air.js.<key>, with {0}, {1} ... replaced by the arguments. */
export const t = pageText('#air-text', 'air.js.');
