import { convertUnit, fromSi, toSi, type DisplayUnit } from '@shared/units';
import { computeOvershoot } from '@shared/sizing';

// js-quantities ships no types; only what these tests use.
type Quantity = { to(unit: string): { scalar: number } };
// eslint-disable-next-line @typescript-eslint/no-require-imports -- js-quantities has no declarations to import with
const Qty: (text: string) => Quantity = require('js-quantities');

const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('conversions against NIST SP 811 (2008)', () => {
  it('1 in = 25.4 mm, exact by definition (NIST SP 811, B.8)', () => {
    expect(convertUnit(1, 'in', 'mm')).toBeCloseTo(25.4, 12);
    expect(convertUnit(25.4, 'mm', 'in')).toBeCloseTo(1, 12);
  });

  it('1 lbf = 4.4482216152605 N (NIST SP 811, B.8)', () => {
    expect(convertUnit(1, 'lbf', 'N')).toBeCloseTo(4.4482216152605, 12);
  });

  it('1 kgf = 9.80665 N, exact by definition (NIST SP 811, B.8)', () => {
    expect(convertUnit(1, 'kgf', 'N')).toBeCloseTo(9.80665, 12);
  });

  it('1 lbf/in = 0.1751268 N/mm (NIST SP 811, B.8: 1.751268 E+02 N/m)', () => {
    expect(convertUnit(1, 'lbf/in', 'N/mm')).toBeCloseTo(0.1751268, 7);
  });

  it('1 kgf/mm = 9.80665 N/mm = 55.997 lbf/in (NIST SP 811 factors: 9.80665 / 0.1751268)', () => {
    expect(convertUnit(1, 'kgf/mm', 'N/mm')).toBeCloseTo(9.80665, 12);
    expect(convertUnit(1, 'kgf/mm', 'lbf/in')).toBeCloseTo(55.997, 3);
  });

  it('1 lb = 0.45359237 kg, exact by definition (NIST SP 811, B.8)', () => {
    expect(convertUnit(1, 'lb', 'kg')).toBeCloseTo(0.45359237, 12);
  });

  it('1 slug = 14.593903 kg, defined here as lbf*s^2/ft (NIST SP 811, B.8: 1.459390 E+01 kg)', () => {
    expect(relative(convertUnit(1, 'slug', 'kg'), 14.593903)).toBeLessThan(1e-7);
  });

  it('toSi and fromSi go to and from mm, kg, N and N/mm', () => {
    expect(toSi(2, 'in')).toBeCloseTo(50.8, 12); // 2 * 25.4 (NIST SP 811)
    expect(toSi(100, 'lbf/in')).toBeCloseTo(17.51268, 5); // 100 * 0.1751268 (NIST SP 811)
    expect(toSi(9.5, 'N/mm')).toBe(9.5);
    const units: DisplayUnit[] = ['mm', 'in', 'kg', 'lb', 'slug', 'N', 'kgf', 'lbf', 'N/mm', 'kgf/mm', 'lbf/in'];
    for (const unit of units) expect(fromSi(toSi(12.5, unit), unit)).toBeCloseTo(12.5, 10);
  });
});

describe('conversions against js-quantities (a second units library, 7 significant digits)', () => {
  const pairs: [string, number, DisplayUnit, DisplayUnit, string, string][] = [
    ['in to mm', 1, 'in', 'mm', '1 in', 'mm'],
    ['lbf to N', 1, 'lbf', 'N', '1 lbf', 'N'],
    ['lb to kg', 1, 'lb', 'kg', '1 lb', 'kg'],
    ['lbf/in to N/mm', 1, 'lbf/in', 'N/mm', '1 lbf/in', 'N/mm'],
    ['N/mm to lbf/in', 10, 'N/mm', 'lbf/in', '10 N/mm', 'lbf/in'],
    ['slug to kg', 1, 'slug', 'kg', '1 slug', 'kg'],
  ];
  it.each(pairs)('%s', (_name, value, from, to, qtyFrom, qtyTo) => {
    const ours = convertUnit(value, from as never, to as never);
    expect(relative(ours, Qty(qtyFrom).to(qtyTo).scalar)).toBeLessThan(1e-6);
  });

  it('js-quantities has no kgf, so kgf is checked through its N against the exact 9.80665 N (NIST SP 811)', () => {
    expect(() => Qty('1 kgf')).toThrow();
    expect(relative(convertUnit(1, 'kgf/mm', 'N/mm'), Qty('9.80665 N/mm').to('N/mm').scalar)).toBeLessThan(1e-12);
  });
});

describe('facts of the trade (common practice, no source)', () => {
  it('a road fork spring of 0.37 kgf/mm is about 20 lbf/in, and 0.5 kgf/mm about 28 lbf/in (within 5 %)', () => {
    expect(relative(convertUnit(0.37, 'kgf/mm', 'lbf/in'), 20)).toBeLessThan(0.05); // 0.37 * 55.997 = 20.72
    expect(relative(convertUnit(0.5, 'kgf/mm', 'lbf/in'), 28)).toBeLessThan(0.05); // 0.5 * 55.997 = 28.00
  });

  it('a damping ratio of 1/sqrt(2) is a common design choice: its load-step overshoot is about 4.3 %', () => {
    // exp(-pi * 0.7071 / 0.7071) = exp(-pi) = 0.0432 (Ogata, Modern Control Engineering, ch. 5).
    expect(computeOvershoot('load', 1 / Math.sqrt(2))).toBeCloseTo(0.0432, 4);
  });
});
