import { checkShopReadings, emptyShopReadings, shopReadingsFrom } from '@/components/quotes/shop-readings';
import { toDisplayUnits } from '@shared/garage/units';

const metric = toDisplayUnits({ system: 'metric', rateUnit: 'N/mm' });
const imperial = toDisplayUnits({ system: 'imperial', rateUnit: 'lbf/in' });

/** Readings in the order of the sag definitions (/work/shared/domain/sizing.md): extended ≥ static ≥ rider. */
function filled(rear: { extended: string; static: [string, string]; rider: [string, string] }) {
  const texts = emptyShopReadings();
  texts.rear.extended.value = rear.extended;
  texts.rear.static = { ...texts.rear.static, pushed: rear.static[0], lifted: rear.static[1] };
  texts.rear.rider = { ...texts.rear.rider, pushed: rear.rider[0], lifted: rear.rider[1] };
  return texts;
}

const good = { extended: '600', static: ['586', '592'], rider: ['541', '549'] } as { extended: string; static: [string, string]; rider: [string, string] };

describe('the desk’s readings of a bike in the shop', () => {
  it('passes good readings and turns them into the engine’s readings, in mm', () => {
    const texts = filled(good);
    expect(checkShopReadings({ ends: ['rear'], texts, travelMm: { rear: 135 }, units: metric, complete: true })).toEqual({});
    expect(shopReadingsFrom(['rear'], texts, metric)).toEqual({
      rear: { extendedMm: 600, staticMm: { pushedMm: 586, liftedMm: 592 }, riderMm: { pushedMm: 541, liftedMm: 549 } },
    });
  });

  it('converts inches (1 in = 25.4 mm exactly, NIST SP 811 appendix B)', () => {
    const texts = filled({ extended: '20', static: ['19', '19'], rider: ['18', '18'] });
    const readings = shopReadingsFrom(['rear'], texts, imperial)!;
    expect(readings.rear!.extendedMm).toBeCloseTo(508, 9);
    expect(readings.rear!.riderMm).toEqual({ pushedMm: expect.closeTo(457.2, 9), liftedMm: expect.closeTo(457.2, 9) });
  });

  it('names the stage whose length is out of order, under its own box', () => {
    const texts = filled({ ...good, rider: ['595', '597'] });
    const errors = checkShopReadings({ ends: ['rear'], texts, travelMm: { rear: 135 }, units: metric, complete: true });
    expect(errors.rear?.rider?.value).toMatch(/rider length is longer than the static/);
    expect(errors.rear?.extended).toBeUndefined();
  });

  it('asks for every box on saving, but not while typing, and only for the ends measured', () => {
    const texts = filled(good);
    texts.rear.static.lifted = '';
    const typing = checkShopReadings({ ends: ['rear'], texts, travelMm: { rear: 135 }, units: metric, complete: false });
    expect(typing.rear?.static?.lifted).toBeUndefined();
    const saving = checkShopReadings({ ends: ['rear'], texts, travelMm: { rear: 135 }, units: metric, complete: true });
    expect(saving.rear?.static?.lifted).toBe('Enter the length after lifting.');
    expect(saving.front).toBeUndefined();
    expect(shopReadingsFrom(['rear'], texts, metric)).toBeNull();
    expect(checkShopReadings({ ends: ['front', 'rear'], texts: filled(good), travelMm: {}, units: metric, complete: true }).front?.extended?.value).toBe(
      'Enter the length you measured.',
    );
  });

  it('takes one reading in place of a pushed and lifted pair', () => {
    const texts = filled(good);
    texts.rear.static = { value: '589', pushed: '', lifted: '', mode: 'single' };
    expect(shopReadingsFrom(['rear'], texts, metric)?.rear?.staticMm).toBe(589);
  });
});
