// Display units and typed numbers. Conversion factors: the inch is exactly 25.4 mm (international
// yard and pound agreement, 1959); 1 kgf = 9.80665 N (standard gravity, ISO 80000-4);
// 1 lbf = 4.4482216152605 N (NIST SP 811, appendix B.8).
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { parseNumber, toMm, fromMm, toNewton, fromNewton, fmt, textFromMm, textToMm } from '../../../static-assets/js/common/units.js';

test('published factors', () => {
  assert.equal(toMm(1, 'inch'), 25.4);
  assert.ok(Math.abs(toMm(25.5, 'inch') - 647.7) <= Number.EPSILON * 647.7);   // 25.5 × 25.4 in doubles
  assert.equal(toNewton(1, 'kgf'), 9.80665);
  assert.equal(toNewton(1, 'lbf'), 4.4482216152605);
  assert.equal(toNewton(1, 'N'), 1);
});

test('round trips stay within a few ulps', () => {
  for (const mm of [0.254, 647.7, 610, 1e-3]) {
    assert.ok(Math.abs(toMm(fromMm(mm, 'inch'), 'inch') - mm) <= 4 * Number.EPSILON * mm);
  }
  for (const n of [70.76, 1, 123.456]) {
    assert.ok(Math.abs(toNewton(fromNewton(n, 'lbf'), 'lbf') - n) <= 4 * Number.EPSILON * n);
  }
});

test('one rule for typed numbers on every page', () => {
  assert.equal(parseNumber('300.5'), 300.5);
  assert.equal(parseNumber(' 300,5 '), 300.5);
  assert.equal(parseNumber('-2'), -2);
  assert.equal(parseNumber('.5'), 0.5);
  assert.equal(parseNumber('1e3'), 1000);
  for (const bad of ['', 'abc', '1,234.5', '1.234,5', '1,2,3', '12 mm', '0x10', 'NaN', 'Infinity', '2.5.1']) {
    assert.ok(Number.isNaN(parseNumber(bad)), bad);
  }
});

test('display rounding', () => {
  assert.equal(fmt(647.6999999999999, 2), '647.70');
  assert.equal(fmt(null), '');
});

test('server messages in the user\'s units, without float noise', async () => {
  const { inUserUnits, figure } = await import('../../../static-assets/js/common/units.js');
  assert.equal(figure(647.6999999999999), '647.7');
  // 647.7 mm = 25.5 in exactly (647.7 / 25.4).
  assert.equal(inUserUnits('must lie strictly between the nut (0) and the bridge (647.6999999999999 mm)', { length: 'inch' }),
    'must lie strictly between the nut (0) and the bridge (25.5 in)');
  assert.equal(inUserUnits('must lie on the string, between 0 and 647.6999999999999 mm', { length: 'mm' }),
    'must lie on the string, between 0 and 647.7 mm');
  assert.equal(inUserUnits('must be at most 100 kg/m'), 'must be at most 100000 g/m');
  assert.equal(inUserUnits('must be at least 1e-9 kg/m'), 'must be at least 0.000001 g/m');
  assert.equal(inUserUnits('must be greater than 0'), 'must be greater than 0');
});

test('lists of lengths (the plate bench outline, graduation points, braces) shown in inches and read back in mm', () => {
  // 25.4 mm = 1 in exactly; 400 mm = 15.748031... in, shown to 4 decimals
  assert.equal(textFromMm('0, 0\n400, 0\n400, 300', 'inch'), '0, 0\n15.748, 0\n15.748, 11.811');
  assert.equal(textFromMm('25.4, -50.8, 2.54', 'inch'), '1, -2, 0.1');
  assert.equal(textToMm('1, -2, 0.1', 'inch'), '25.4, -50.8, 2.54');
  const [a, b] = textToMm('15.75, 11.8125', 'inch').split(', ').map(Number);
  assert.ok(Math.abs(a - 400.05) <= 4 * Number.EPSILON * 400.05 && Math.abs(b - 300.0375) <= 4 * Number.EPSILON * 300.0375);
  // words and separators are kept, so a typo still reaches the server as typed and is named there
  assert.equal(textToMm('1, x; 2', 'inch'), '25.4, x; 50.8');
  // in mm nothing is touched, not even the way a number was written
  assert.equal(textFromMm('3.0, 1e2', 'mm'), '3.0, 1e2');
  assert.equal(textToMm('3.0, 1e2', 'mm'), '3.0, 1e2');
});
