// The one job follower (common/jobs.js) of the templates solver, the bar tuning and the plate thickness
// solver: polls until the job is finished, a later poll speaks instead of an earlier one, and refused or
// lost polls reach the page. Driven by a fake server whose answers the test releases one by one.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { createJobFollower, JOBS_PATH } from '../../../static-assets/js/common/jobs.js';

function heldServer() {
  const gets = [];
  const dels = [];
  return {
    gets,
    dels,
    get: (url) => new Promise((resolve, reject) => gets.push({ url, resolve, reject })),
    del: (url) => new Promise((resolve) => dels.push({ url, resolve })),
  };
}

const job = (status, extra = {}) => ({ ok: true, status: 200, data: { status, progress: { fraction: 0.5 }, ...extra } });
const settle = () => new Promise((r) => setTimeout(r, 5));

function recorder(server) {
  const log = [];
  const follower = createJobFollower({
    interval: 1, get: server.get, del: server.del,
    progress: (j) => log.push(['progress', j.status]),
    finished: (j) => log.push(['finished', j.status]),
    failed: (a) => log.push(['failed', a.status]),
  });
  return { log, follower };
}

test('polls the job path until the job is finished, then stops', async () => {
  const server = heldServer();
  const { log, follower } = recorder(server);
  follower.follow('a/b');
  assert.equal(server.gets.length, 1, 'the first poll goes at once');
  assert.equal(server.gets[0].url, `${JOBS_PATH}a%2Fb`, 'the id is encoded into the job path');
  server.gets[0].resolve(job('queued'));
  await settle();
  server.gets[1].resolve(job('running'));
  await settle();
  assert.equal(follower.running, true);
  server.gets[2].resolve(job('succeeded', { result: 42 }));
  await settle();
  assert.deepEqual(log, [['progress', 'queued'], ['progress', 'running'], ['finished', 'succeeded']]);
  assert.equal(follower.running, false);
  await settle();
  assert.equal(server.gets.length, 3, 'no poll after the job finished');
});

test('a cancel deletes the job and polls at once; the earlier poll, answered late, is not shown', async () => {
  const server = heldServer();
  const { log, follower } = recorder(server);
  follower.follow('j1');
  const cancelled = follower.cancel();
  await settle();
  assert.equal(server.dels.length, 1);
  assert.equal(server.dels[0].url, `${JOBS_PATH}j1`);
  server.dels[0].resolve({ ok: true, status: 202 });
  assert.deepEqual(await cancelled, { ok: true, status: 202 }, 'the DELETE answer goes back to the page');
  assert.equal(server.gets.length, 2, 'the cancel polls at once');
  server.gets[1].resolve(job('cancelled'));
  await settle();
  server.gets[0].resolve(job('running'));
  await settle();
  assert.deepEqual(log, [['finished', 'cancelled']], 'the stale "running" answer says nothing');
  assert.equal(server.gets.length, 2, 'and starts no further polling');
});

test('a refused poll reaches the page and stops the polls; the job is still followed', async () => {
  const server = heldServer();
  const { log, follower } = recorder(server);
  follower.follow('j2');
  server.gets[0].resolve({ ok: false, status: 404, problem: { detail: 'no solve job j2' } });
  await settle();
  assert.deepEqual(log, [['failed', 404]]);
  assert.equal(server.gets.length, 1);
  assert.equal(follower.running, true);
  follower.cancel();
  await settle();
  assert.equal(server.dels.length, 1, 'a cancel still reaches the job');
});

test('a lost poll (the fetch rejects) reaches the page as failed, never silently', async () => {
  const server = heldServer();
  const { log, follower } = recorder(server);
  follower.follow('j3');
  server.gets[0].reject(new TypeError('Failed to fetch'));
  await settle();
  assert.deepEqual(log, [['failed', 'TypeError: Failed to fetch']]);
});

test('cancel without a job asks nothing', async () => {
  const server = heldServer();
  const { follower } = recorder(server);
  assert.equal(await follower.cancel(), null);
  assert.equal(server.dels.length, 0);
});
