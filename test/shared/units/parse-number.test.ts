import { parseUserNumber } from '@shared/units';

describe('parseUserNumber: numbers as people type them', () => {
  it.each([
    ['12,5', 12.5],
    ['12.5', 12.5],
    [' 12,5 ', 12.5],
    ['-3', -3],
    ['+7', 7],
    [',5', 0.5],
    ['5,', 5],
    ['0', 0],
  ])('reads %j as %d', (text, value) => {
    expect(parseUserNumber(text)).toBe(value);
  });

  it.each(['', '   ', 'abc', '12,5 mm', '1.250,5', '1 250', '1e3', '--2', ',', 'NaN', 'Infinity'])(
    'refuses %j with undefined, never NaN',
    (text) => {
      expect(parseUserNumber(text)).toBeUndefined();
    },
  );

  it('passes finite numbers through and refuses NaN, Infinity, null and undefined', () => {
    expect(parseUserNumber(9.5)).toBe(9.5);
    expect(parseUserNumber(Number.NaN)).toBeUndefined();
    expect(parseUserNumber(Number.POSITIVE_INFINITY)).toBeUndefined();
    expect(parseUserNumber(null)).toBeUndefined();
    expect(parseUserNumber(undefined)).toBeUndefined();
  });
});
