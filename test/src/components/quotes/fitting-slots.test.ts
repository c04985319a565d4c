import { bookableDays, dayKeyOf, slotLabel, slotsOn } from '@/components/quotes/fitting-slots';

// 2026-12-02 is a Wednesday and 2026-12-06 a Sunday (the Gregorian calendar; checked with `cal 12 2026`).
const wednesdayNoon = new Date(2026, 11, 2, 12, 0);

describe('fitting slots', () => {
  it('offers 08:00 to 17:30 every 30 minutes on a working day (common practice, no source)', () => {
    const slots = slotsOn('2026-12-03', wednesdayNoon).map(slotLabel);
    expect(slots).toHaveLength(20);
    expect(slots.slice(0, 3)).toEqual(['08:00', '08:30', '09:00']);
    expect(slots.at(-1)).toBe('17:30');
  });

  it('leaves out the slots already past, and the exact moment itself, since the server wants the future', () => {
    const slots = slotsOn('2026-12-02', wednesdayNoon).map(slotLabel);
    expect(slots[0]).toBe('12:30');
    expect(slots).toHaveLength(11);
  });

  it('offers nothing on a Sunday', () => {
    expect(slotsOn('2026-12-06', wednesdayNoon)).toEqual([]);
  });

  it('lists the next bookable days, skipping a Sunday and a day already over', () => {
    expect(bookableDays(wednesdayNoon, 5)).toEqual(['2026-12-02', '2026-12-03', '2026-12-04', '2026-12-05', '2026-12-07']);
    const wednesdayEvening = new Date(2026, 11, 2, 18, 0);
    expect(bookableDays(wednesdayEvening, 1)).toEqual(['2026-12-03']);
  });

  it('reads a day in local time, across a month end', () => {
    expect(dayKeyOf(new Date(2026, 11, 31, 23, 59))).toBe('2026-12-31');
    expect(bookableDays(new Date(2026, 11, 31, 18, 0), 1)).toEqual(['2027-01-01']);
  });
});
