/**
 * The days and times a fitting can be booked at, in the desk's own time zone. The shop's hours are
 * not stored, so the slots are a workshop's usual day: Monday to Saturday, every 30 minutes from
 * 08:00 to 17:30 (common practice, no source). A slot in the past is not offered, since the server
 * refuses a fitting that is not in the future.
 */

export const SLOT_MINUTES = 30;
export const FIRST_SLOT = { hour: 8, minute: 0 };
export const LAST_SLOT = { hour: 17, minute: 30 };
const SUNDAY = 0;

/** A calendar day as `YYYY-MM-DD`, read in local time. */
export type DayKey = string;

export function dayKeyOf(date: Date): DayKey {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}`;
}

/** Local midnight of the day. */
function startOfDay(key: DayKey): Date {
  const [year, month, day] = key.split('-').map(Number);
  return new Date(year, month - 1, day);
}

/** Every slot of one day, later than `now`, as local times. */
export function slotsOn(day: DayKey, now: Date): Date[] {
  const base = startOfDay(day);
  if (base.getDay() === SUNDAY) return [];
  const slots: Date[] = [];
  const last = LAST_SLOT.hour * 60 + LAST_SLOT.minute;
  for (let minutes = FIRST_SLOT.hour * 60 + FIRST_SLOT.minute; minutes <= last; minutes += SLOT_MINUTES) {
    const slot = new Date(base.getFullYear(), base.getMonth(), base.getDate(), Math.floor(minutes / 60), minutes % 60);
    if (slot.getTime() > now.getTime()) slots.push(slot);
  }
  return slots;
}

/** The next `count` days that still have a slot free of the past, from today on. */
export function bookableDays(now: Date, count: number): DayKey[] {
  const days: DayKey[] = [];
  for (let offset = 0; days.length < count; offset++) {
    const day = dayKeyOf(new Date(now.getFullYear(), now.getMonth(), now.getDate() + offset));
    if (slotsOn(day, now).length > 0) days.push(day);
  }
  return days;
}

/** `HH:MM` of a slot, in local time: how the slot buttons read. */
export function slotLabel(slot: Date): string {
  return `${String(slot.getHours()).padStart(2, '0')}:${String(slot.getMinutes()).padStart(2, '0')}`;
}
