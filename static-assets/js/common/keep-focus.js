// A view that is drawn anew (table rows, an SVG) keeps the keyboard user's place: the focused
// control is found again after the redraw by its data attributes, and an input keeps its caret.

const KEYS = ['row', 'key', 'hole', 'handle', 'action', 'field'];

/** The attributes that name a control again after a redraw, or null when it has none. */
export function focusKey(element) {
  if (!element?.dataset) return null;
  const parts = KEYS.filter((k) => element.dataset[k] !== undefined).map((k) => `[data-${k}="${CSS.escape(element.dataset[k])}"]`);
  return parts.length ? parts.join('') : null;
}

/** Runs redraw(); when the focus was inside one of the containers, puts it back on the same control. */
export function keepFocus(containers, redraw) {
  const list = (Array.isArray(containers) ? containers : [containers]).filter(Boolean);
  const active = document.activeElement;
  const home = list.find((c) => c.contains(active) && c !== active);
  const selector = home ? focusKey(active) : null;
  const caret = selector && typeof active.selectionStart === 'number' ? [active.selectionStart, active.selectionEnd] : null;
  redraw();
  if (!selector) return;
  const again = home.querySelector(selector);
  if (!again || again === active) return;
  again.focus({ preventScroll: true });
  if (caret) {
    try { again.setSelectionRange(caret[0], caret[1]); } catch { /* a select or checkbox has no caret */ }
  }
}
