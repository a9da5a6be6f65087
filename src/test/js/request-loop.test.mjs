// The page's request loop: coalescing, ordering, markers, refusals and replay, driven by a fake
// server whose answers the test releases one by one.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { createRequestLoop } from '../../../static-assets/js/common/request-loop.js';

/** A server that holds every request until the test answers it. */
function heldServer() {
  const calls = [];
  const send = (request) => new Promise((resolve, reject) => calls.push({ request, resolve, reject }));
  return { calls, send };
}

function recordingView() {
  const log = [];
  return {
    log,
    busy: (on) => log.push(['busy', on]),
    answered: (request, response, seq) => log.push(['answered', response, seq]),
    refused: (problem, request, seq, local) => log.push(['refused', problem, seq, local]),
    failed: (error, seq) => log.push(['failed', String(error), seq]),
  };
}

const tick = () => new Promise((r) => setImmediate(r));

test('an idle loop sends at once (no fixed delay)', async () => {
  const server = heldServer();
  const loop = createRequestLoop({ build: () => ({ request: { x: 1 } }), send: server.send, view: recordingView() });
  loop.run();
  assert.equal(server.calls.length, 1, 'sent synchronously, before any timer');
  assert.equal(loop.busy, true);
});

test('many changes while one request is in flight give exactly one more request, built from the latest state', async () => {
  const server = heldServer();
  const view = recordingView();
  let x = 1;
  const loop = createRequestLoop({ build: () => ({ request: { x } }), send: server.send, view });
  const first = loop.run();
  const later = [];
  for (x = 2; x <= 6; x++) later.push(loop.run());
  x = 6;
  assert.equal(server.calls.length, 1, 'at most one in flight');
  server.calls[0].resolve({ ok: true, data: 'a1' });
  await first;
  await tick();
  assert.equal(server.calls.length, 2, 'one pending request follows');
  assert.deepEqual(server.calls[1].request, { x: 6 });
  server.calls[1].resolve({ ok: true, data: 'a6' });
  await Promise.all(later);
  assert.equal(server.calls.length, 2, 'nothing more once idle');
  assert.deepEqual(view.log.filter((e) => e[0] === 'answered').map((e) => e[1]), ['a1', 'a6']);
  assert.deepEqual(view.log.filter((e) => e[0] === 'busy'), [['busy', true], ['busy', false]], 'busy from the first send until idle');
  assert.equal(loop.busy, false);
  assert.deepEqual(loop.last, { request: { x: 6 }, response: 'a6' });
});

test('answers are shown in order and sequence numbers only grow', async () => {
  const server = heldServer();
  const view = recordingView();
  const loop = createRequestLoop({ build: () => ({ request: {} }), send: server.send, view });
  const a = loop.run();
  const b = loop.run();
  server.calls[0].resolve({ ok: true, data: 'first' });
  await a;
  await tick();
  server.calls[1].resolve({ ok: true, data: 'second' });
  await b;
  const seqs = view.log.filter((e) => e[0] === 'answered').map((e) => e[2]);
  assert.deepEqual(seqs, [1, 2]);
});

test('a refusal goes to the view with its field errors; local problems are never sent', async () => {
  const server = heldServer();
  const view = recordingView();
  let problems = [{ field: 'lengthMm', message: 'enter a number' }];
  const loop = createRequestLoop({ build: () => ({ request: { lengthMm: null }, problems }), send: server.send, view });
  await loop.run();
  assert.equal(server.calls.length, 0);
  assert.deepEqual(view.log.at(-1), ['refused', { errors: problems }, 1, true]);
  problems = [];
  const r = loop.run();
  const problem = { status: 400, errors: [{ field: 'lengthMm', message: 'must be greater than 0' }] };
  server.calls[0].resolve({ ok: false, status: 400, problem });
  await r;
  assert.deepEqual(view.log.at(-2), ['refused', problem, 2, false]);
  assert.deepEqual(view.log.at(-1), ['busy', false]);
  assert.equal(loop.last, null, 'nothing answered yet');
});

test('a server that does not answer is a failure, not a refusal, and the loop stays usable', async () => {
  const server = heldServer();
  const view = recordingView();
  const loop = createRequestLoop({ build: () => ({ request: {} }), send: server.send, view });
  const r = loop.run();
  server.calls[0].reject(new TypeError('Failed to fetch'));
  await r;
  assert.deepEqual(view.log.at(-2), ['failed', 'TypeError: Failed to fetch', 1]);
  const s = loop.run();
  server.calls[1].resolve({ ok: true, data: 'back' });
  await s;
  assert.deepEqual(view.log.at(-2), ['answered', 'back', 2]);
});

test('each answer is announced, and replayed to a panel that loads late', async () => {
  const server = heldServer();
  const target = new EventTarget();
  const seen = [];
  const loop = createRequestLoop({ build: () => ({ request: { n: 1 } }), send: server.send, event: 'nodewright:test-analyzed', target });
  loop.replay();   // nothing yet: no event
  target.addEventListener('nodewright:test-analyzed', (e) => seen.push(e.detail));
  const r = loop.run();
  server.calls[0].resolve({ ok: true, data: { f: 440 } });
  await r;
  const late = [];
  target.addEventListener('nodewright:test-analyzed', (e) => late.push(e.detail));
  loop.replay();
  assert.deepEqual(seen, [{ request: { n: 1 }, response: { f: 440 } }, { request: { n: 1 }, response: { f: 440 } }]);
  assert.deepEqual(late, [{ request: { n: 1 }, response: { f: 440 } }]);
});

test('a run() made while an answer is being drawn follows it', async () => {
  const server = heldServer();
  let loop;
  let again = true;
  const view = { answered: () => { if (again) { again = false; loop.run(); } } };
  loop = createRequestLoop({ build: () => ({ request: {} }), send: server.send, view });
  const r = loop.run();
  server.calls[0].resolve({ ok: true, data: 1 });
  await tick();
  assert.equal(server.calls.length, 2);
  server.calls[1].resolve({ ok: true, data: 2 });
  await r;
  assert.equal(loop.seq, 2);
});
