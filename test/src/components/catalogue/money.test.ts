import { formatMoney } from '@/components/catalogue/money';

// Check values worked by hand: 100 cents to the euro, thousands grouped with commas.
describe('formatMoney', () => {
  it.each([
    [0, '€0.00'],
    [5, '€0.05'],
    [1250, '€12.50'],
    [8900, '€89.00'],
    [123456789, '€1,234,567.89'],
    [-1999, '-€19.99'],
  ])('shows %i cents as %s', (cents, text) => {
    expect(formatMoney(cents)).toBe(text);
  });

  it('names a currency it has no symbol for', () => {
    expect(formatMoney(1250, 'CHF')).toBe('12.50 CHF');
  });

  it('shows a missing price as a dash', () => {
    expect(formatMoney(null)).toBe('–');
  });

  it('refuses half a cent: money only ever comes as whole cents', () => {
    expect(() => formatMoney(1250.5)).toThrow(RangeError);
  });
});
