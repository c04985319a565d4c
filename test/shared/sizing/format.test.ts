import { formatNumber } from '@shared/sizing/format';

describe('formatNumber: figures in the engine\'s sentences', () => {
  it.each([
    [23.047, 1, '23'],
    [23.05, 1, '23.1'],
    [1.25, 2, '1.25'],
    [3.004, 2, '3'],
    [3.05, 2, '3.05'],
    [0.007, 3, '0.007'],
    [0.1 + 0.2, 2, '0.3'],
    [-2.5, 1, '-2.5'],
    [-0.04, 1, '0'],
    [10.5, 0, '11'],
  ])('writes %d to %d places as %s', (value, digits, text) => {
    expect(formatNumber(value, digits)).toBe(text);
  });
});
