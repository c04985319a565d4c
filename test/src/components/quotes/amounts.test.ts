import { formatHundredths, formatPercent, parseBasisPoints, parseCents } from '@/components/quotes/amounts';

// Check values: decimal arithmetic by hand (1 unit = 100 cents, 1 % = 100 basis points).
describe('typed amounts', () => {
  it('reads money into integer cents', () => {
    expect(parseCents('72.00')).toBe(7200);
    expect(parseCents('72.5')).toBe(7250);
    expect(parseCents(' 72 ')).toBe(7200);
    expect(parseCents('72,05')).toBe(7205);
    expect(parseCents('0.07')).toBe(7);
  });

  it('never adds float noise: 0.1 + 0.2 is 30 cents exactly', () => {
    const sum = (parseCents('0.1') ?? Number.NaN) + (parseCents('0.2') ?? Number.NaN);
    expect(sum).toBe(30);
    expect(Number.isInteger(sum)).toBe(true);
    expect(parseCents('1.15')).toBe(115);
    expect(parseCents('4.35')).toBe(435);
  });

  it('refuses anything but a plain amount with two decimals at most', () => {
    for (const typed of ['abc', '', '.5', '7.', '72.505', '-1', '1e3', '7 2']) expect(parseCents(typed)).toBeNull();
  });

  it('reads a tax percentage into basis points', () => {
    expect(parseBasisPoints('20')).toBe(2000);
    expect(parseBasisPoints('7.5')).toBe(750);
    expect(parseBasisPoints('0.25')).toBe(25);
    expect(parseBasisPoints('twenty')).toBeNull();
  });

  it('shows the integers back as typed text', () => {
    expect(formatHundredths(7250)).toBe('72.50');
    expect(formatHundredths(5)).toBe('0.05');
    expect(formatPercent(2000)).toBe('20');
    expect(formatPercent(750)).toBe('7.5');
    expect(formatPercent(2125)).toBe('21.25');
  });
});
