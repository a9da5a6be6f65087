// The page's request loop: every bench sends its analysis through one of these.
//
//   const loop = createRequestLoop({ build, send, view, event });
//     build()  → { request, problems }   the request for what the page shows now, and the fields
//                                          the page can already refuse ([{field, message}])
//     send(request) → Promise<{ok, status, data, problem}>   (api.js postJson and friends)
//     view     { busy(on), answered(request, response, seq), refused(problem, request, seq, local),
//                failed(error, seq) }   (formView below builds one for a form)
//     event    the document event sent after each answer with {request, response}, and replayed
//              to a panel that loads late (loop.replay())
//   loop.run() → Promise resolved once an answer (or refusal) for the page as it is now is shown.
//
// Coalescing: at most one request is in flight. A run() while one is in flight marks a run as
// pending; when the answer arrives, ONE request is built from the page as it is then (the latest
// state, however many changes came meanwhile). No fixed delay when idle: a change is sent at once.
// Answers come back in the order they were sent, and an answer older than the one shown is dropped.
import { clearFieldErrors, showFieldErrors } from './api.js';

export function createRequestLoop({ build, send, view = {}, event = null, target = null }) {
  const state = { seq: 0, shown: 0, inFlight: false, draining: false, busyShown: false, pending: null, last: null };

  const dispatch = (detail) => {
    const to = target ?? (typeof document !== 'undefined' ? document : null);
    if (event && to) to.dispatchEvent(new CustomEvent(event, { detail }));
  };

  async function once() {
    const { request, problems = [] } = build();
    const seq = ++state.seq;
    if (problems.length) {
      state.shown = seq;
      view.refused?.({ errors: problems }, request, seq, true);
      return;
    }
    state.inFlight = true;
    if (!state.busyShown) { state.busyShown = true; view.busy?.(true); }
    let answer;
    try {
      answer = await send(request);
    } catch (error) {
      answer = { ok: false, status: 0, error };
    }
    state.inFlight = false;
    if (seq <= state.shown) return;   // never show an answer older than one shown
    state.shown = seq;
    if (answer.ok) {
      state.last = { request, response: answer.data };
      view.answered?.(request, answer.data, seq);
      dispatch(state.last);
    } else if (answer.status === 0 || answer.status >= 500 || !answer.problem) {
      view.failed?.(answer.error ?? answer.problem ?? answer.status, seq);
    } else {
      view.refused?.(answer.problem, request, seq, false);
    }
  }

  const waiter = () => {
    let resolve;
    const promise = new Promise((r) => { resolve = r; });
    return { promise, resolve };
  };

  async function drain(first) {
    let batch = first;
    try {
      while (batch) {
        try {
          await once();
        } finally {
          batch.resolve();
        }
        batch = state.pending;
        state.pending = null;
      }
    } finally {
      state.draining = false;
      if (state.busyShown) { state.busyShown = false; view.busy?.(false); }
    }
  }

  /**
   * Sends now when idle; otherwise one more request follows the one in flight. Resolves once the
   * answer to a request built after this call has been handled.
   */
  function run() {
    if (state.draining) {
      state.pending ??= waiter();
      return state.pending.promise;
    }
    state.draining = true;
    const first = waiter();
    drain(first);
    return first.promise;
  }

  return {
    run,
    /** The last answer shown: {request, response}, or null. */
    get last() { return state.last; },
    /** How many requests were built so far (answered, refused or dropped). */
    get seq() { return state.seq; },
    get busy() { return state.inFlight; },
    /** Sends the last answer's event again (to a panel that loaded after it). */
    replay() { if (state.last) dispatch(state.last); },
  };
}

/**
 * A view for a form-based page: field errors on the form's inputs ([data-field]), a message line,
 * a busy marker (an element hidden while idle, or a function(on)) and a stale marker (class 'stale' while the results shown do
 * not belong to the form's values). render(request, response) draws an answer.
 *   text: { fix: message for refusals, down: message when the server did not answer }
 *   prepare(problem) → problem: e.g. the messages in the user's units (units.js inUserUnits)
 */
export function formView({ form, message, busy, stale = [], render, text, onRefused, prepare = (p) => p }) {
  const staleEls = () => (typeof stale === 'function' ? stale() : stale);
  const mark = (on) => staleEls().forEach((el) => el.classList.toggle('stale', on));
  return {
    busy(on) {
      if (typeof busy === 'function') busy(on);
      else if (busy) busy.hidden = !on;
    },
    answered(request, response, seq) {
      clearFieldErrors(form);
      if (message) { message.textContent = ''; message.classList.remove('bad'); }
      mark(false);
      render(request, response, seq);
    },
    refused(problem, request, seq, local) {
      problem = prepare(problem);
      const unclaimed = showFieldErrors(form, problem);
      const detail = !local && problem?.detail ? ` ${problem.detail}` : '';
      if (message) {
        message.textContent = `${text.fix}${detail}${unclaimed.length ? ` ${unclaimed.join('; ')}` : ''}`;
        message.classList.add('bad');
      }
      mark(true);
      onRefused?.(problem, request, seq, local);
    },
    failed() {
      if (message) { message.textContent = text.down; message.classList.add('bad'); }
      mark(true);
    },
  };
}
