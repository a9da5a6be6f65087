// The one text lookup: placeholders filled, missing texts shown as their key.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { format, lookup } from '../../../static-assets/js/common/text.js';

test('placeholders', () => {
  assert.equal(format('At {0}: nodes of modes {1}', '12.00 mm', '2, 4'), 'At 12.00 mm: nodes of modes 2, 4');
  assert.equal(format('{1} before {0}', 'a', 'b'), 'b before a');
  assert.equal(format('kept {2}', 'a'), 'kept {2}');
  assert.equal(format(undefined), '');
});

test('lookup with a prefix', () => {
  const t = lookup(new Map([['air.js.fixFields', 'Fix {0} fields']]), 'air.js.');
  assert.equal(t('fixFields', 2), 'Fix 2 fields');
  assert.equal(t('missing'), 'missing');
});
