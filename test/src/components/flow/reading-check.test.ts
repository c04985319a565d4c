import { checkReading, type ReadingTexts } from '@/components/flow/reading-check';
import { toDisplayUnits } from '@shared/garage/units';

const metric = toDisplayUnits({ system: 'metric', rateUnit: 'N/mm' });
const imperial = toDisplayUnits({ system: 'imperial', rateUnit: 'lbf/in' });
const pair = (pushed: string, lifted: string): ReadingTexts => ({ value: '', pushed, lifted, mode: 'pair' });
const single = (value: string): ReadingTexts => ({ value, pushed: '', lifted: '', mode: 'single' });

const base = { end: 'rear' as const, travelMm: 135, units: metric, complete: false };

describe('each measuring step’s check', () => {
  it('extended: a length within the physical range', () => {
    expect(checkReading({ ...base, field: 'extendedMm', texts: single('600'), answers: {} })).toEqual({});
    expect(checkReading({ ...base, field: 'extendedMm', texts: single('2500'), answers: {} }).value).toMatch(/at most 2000 mm/);
    expect(checkReading({ ...base, field: 'extendedMm', texts: single('six'), answers: {} }).value).toMatch(/must be a number/);
  });

  it('static: accepts a decimal comma and refuses a length above the extended one', () => {
    const answers = { rear: { extendedMm: 600 } };
    expect(checkReading({ ...base, field: 'staticMm', texts: pair('586,5', '592'), answers })).toEqual({});
    expect(checkReading({ ...base, field: 'staticMm', texts: pair('610', '612'), answers }).value).toMatch(
      /static length is longer than the extended length: re-measure/,
    );
  });

  it('rider: refuses a length above the static one and a sag beyond the travel', () => {
    const answers = { rear: { extendedMm: 600, staticMm: { pushedMm: 586, liftedMm: 592 } } };
    expect(checkReading({ ...base, field: 'riderMm', texts: pair('541', '549'), answers })).toEqual({});
    expect(checkReading({ ...base, field: 'riderMm', texts: pair('595', '597'), answers }).value).toMatch(/rider length is longer than the static/);
    expect(checkReading({ ...base, field: 'riderMm', texts: single('400'), answers }).value).toMatch(/more than the travel/);
  });

  it('names the missing half of a pair only when moving on', () => {
    const answers = { rear: { extendedMm: 600 } };
    expect(checkReading({ ...base, field: 'staticMm', texts: pair('586', ''), answers })).toEqual({});
    expect(checkReading({ ...base, field: 'staticMm', texts: pair('586', ''), answers, complete: true }).lifted).toBe('Enter the length after lifting.');
  });

  it('reads inches as typed (23,5 in = 596.9 mm, below the 600 mm extended length)', () => {
    const answers = { rear: { extendedMm: 600 } };
    expect(checkReading({ ...base, units: imperial, field: 'staticMm', texts: single('23,5'), answers })).toEqual({});
    expect(checkReading({ ...base, units: imperial, field: 'staticMm', texts: single('24'), answers }).value).toMatch(/longer than the extended/);
  });
});
