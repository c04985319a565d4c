/**
 * The quote money rule against hand-worked examples. Half up and half to even are the usual
 * definitions (common practice, no source); the float counter-example is IEEE 754 doubles:
 * 1.005 is stored as 1.00499999999999989..., so Math.round(1.005 * 100) is 100.
 */
import { computeQuoteTotals, depositCents, labourCents, taxCents } from '../../../shared/money/quote-totals';
import { divideRoundHalfEven, divideRoundHalfUp } from '../../../shared/money/rounding';

test('half up and half to even differ only on an exact half', () => {
  expect(divideRoundHalfUp(5, 2)).toBe(3);
  expect(divideRoundHalfEven(5, 2)).toBe(2);
  expect(divideRoundHalfEven(7, 2)).toBe(4);
  expect(divideRoundHalfUp(7, 3)).toBe(2);
  expect(divideRoundHalfEven(8, 3)).toBe(3);
  expect(() => divideRoundHalfUp(1.5, 2)).toThrow(RangeError);
  expect(() => divideRoundHalfEven(1, 0)).toThrow(RangeError);
});

test('a half cent rounds as the rule says where floating point would not', () => {
  // 1.005 units of 100 cents: the float product misses the half; the integer rule sees it.
  expect(Math.round(1.005 * 100)).toBe(100);
  expect(divideRoundHalfUp(1005, 10)).toBe(101);
  // Labour: 3 minutes at 1010 cents an hour is 50.5 cents: half up gives 51.
  expect(labourCents(3, 1010)).toBe(51);
  // Tax: 10 % of 1005 cents is 100.5 cents: half to even gives 100; of 1015 cents, 101.5 gives 102.
  expect(taxCents(1005, 1000)).toBe(100);
  expect(taxCents(1015, 1000)).toBe(102);
  // Math.round on the float product rounds that half up to 101; the rule gives 100.
  expect(Math.round(1005 * 0.1)).toBe(101);
});

test('a quote of parts and labour, worked by hand', () => {
  // 2 x 65.50 + 1 x 130.00 = 261.00; labour at 70.00/h: 60 min 70.00, 45 min 52.50, 20 min 23.333 -> 23.33;
  // subtotal 406.83; 20 % tax 81.366 -> 81.37; total 488.20.
  const totals = computeQuoteTotals(
    [
      { kind: 'spring', quantity: 2, unitPriceCents: 6550 },
      { kind: 'spring', quantity: 1, unitPriceCents: 13000 },
      { kind: 'labour', quantity: 1, minutes: 60, rateCentsPerHour: 7000 },
      { kind: 'labour', quantity: 1, minutes: 45, rateCentsPerHour: 7000 },
      { kind: 'labour', quantity: 1, minutes: 20, rateCentsPerHour: 7000 },
    ],
    2000,
  );
  expect(totals).toEqual({ lineCents: [13100, 13000, 7000, 5250, 2333], partsCents: 26100, labourCents: 14583, subtotalCents: 40683, taxCents: 8137, totalCents: 48820 });
});

test('deposits: a percentage rounds half up, a fixed sum is capped at the total', () => {
  expect(depositCents(48820, { kind: 'percent', basisPoints: 3000 })).toBe(14646);
  // 25 % of 1002 cents is 250.5: half up gives 251.
  expect(depositCents(1002, { kind: 'percent', basisPoints: 2500 })).toBe(251);
  expect(depositCents(5000, { kind: 'fixed', cents: 10000 })).toBe(5000);
  expect(depositCents(50000, { kind: 'fixed', cents: 10000 })).toBe(10000);
});
