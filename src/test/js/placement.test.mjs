// A new pickup goes where there is room (issue: the eighth pickup used to land at a negative position).
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { nextPickupMm, PICKUP_ZONE } from '../../../static-assets/js/strings/placement.js';

test('pickups added one after another stay inside the string and apart, until there is no room', () => {
  const L = 650;
  const placed = [];
  for (let i = 0; i < 40; i++) {
    const x = nextPickupMm(L, placed, 20);
    if (x === null) break;
    placed.push(x);
  }
  assert.ok(placed.length >= 6, `only ${placed.length} placed`);
  assert.ok(placed.length < 40, 'the zone fills up');
  const sorted = [...placed].sort((a, b) => a - b);
  assert.ok(sorted[0] >= PICKUP_ZONE[0] * L && sorted.at(-1) <= PICKUP_ZONE[1] * L);
  for (let i = 1; i < sorted.length; i++) assert.ok(sorted[i] - sorted[i - 1] >= 20 - 0.1, `${sorted[i - 1]} and ${sorted[i]}`);
  assert.equal(nextPickupMm(L, placed, 20), null);
});

test('the first pickup goes in the middle of the zone', () => {
  assert.equal(nextPickupMm(1000, [], 10), 835);
});

test('pickups outside the zone do not block it', () => {
  assert.equal(nextPickupMm(1000, [100, 2000, NaN], 10), 835);
});
