/**
 * Check values: NIST SP 811 (2008), appendix B.8 and B.9: 1 in = 25.4 mm exactly;
 * 1 lbf/in = 1.751268 E+02 N/m = 0.1751268 N/mm; 1 kgf = 9.80665 N exactly, so 1 kgf/mm = 9.80665 N/mm;
 * 1 lb = 0.45359237 kg exactly.
 */
import { formatQuantity, fromFieldText, toDisplay } from '@/components/units/format';
import { toDisplayUnits } from '@shared/garage/units';

const metric = toDisplayUnits({ system: 'metric', rateUnit: 'N/mm' });
const metricKgf = toDisplayUnits({ system: 'metric', rateUnit: 'kgf/mm' });
const imperial = toDisplayUnits({ system: 'imperial', rateUnit: 'lbf/in' });

describe('figures in the person’s units', () => {
  it('shows the same length in mm and in inches (1 in = 25.4 mm)', () => {
    expect(formatQuantity(254, 'length', metric)).toBe('254 mm');
    expect(formatQuantity(254, 'length', imperial)).toBe('10 in');
    expect(toDisplay(25.4, 'length', imperial)).toBeCloseTo(1, 12);
  });

  it('shows a rate in N/mm, kgf/mm and lbf/in', () => {
    expect(formatQuantity(9.80665, 'rate', metricKgf)).toBe('1 kgf/mm');
    expect(toDisplay(9.80665, 'rate', metricKgf)).toBeCloseTo(1, 9);
    expect(toDisplay(0.1751268, 'rate', imperial)).toBeCloseTo(1, 6);
    expect(formatQuantity(17.51268, 'rate', imperial)).toBe('100 lbf/in');
    expect(formatQuantity(95, 'rate', metric)).toBe('95 N/mm');
  });

  it('shows masses in kg and lb (1 lb = 0.45359237 kg)', () => {
    expect(formatQuantity(45.359237, 'mass', imperial)).toBe('100 lb');
  });

  it('reads typed text with a decimal point or comma back to SI', () => {
    expect(fromFieldText('12,5', 'length', metric)).toBe(12.5);
    expect(fromFieldText('1,5', 'length', imperial)).toBeCloseTo(38.1, 12);
    expect(fromFieldText('abc', 'length', metric)).toBe('abc');
    expect(fromFieldText('  ', 'length', metric)).toBeUndefined();
  });
});
