import { readdirSync, readFileSync } from 'fs';
import { join } from 'path';
import { buildWarningThresholds, SETTING_KEYS } from '@shared/sizing';
import { engineSettingSeeds, targetProfileSeeds } from '../../../server/seed/sizing-defaults';

const middle = ([min, max]: [number, number]) => (min + max) / 2;

describe('seeded engine settings (common practice / from memory, no published source)', () => {
  it('cover every setting the engine reads, each labelled with where it comes from', () => {
    expect(engineSettingSeeds.map((s) => s.key).sort()).toEqual([...SETTING_KEYS].sort());
    for (const seed of engineSettingSeeds) {
      expect(['common practice', 'from memory']).toContain(seed.source);
      expect(seed.label.length).toBeGreaterThan(5);
    }
  });

  it('build the thresholds the spec names', () => {
    const t = buildWarningThresholds(engineSettingSeeds);
    expect(t.frictionSpreadMm).toEqual({ front: 10, rear: 5 }); // section 1, common practice
    expect(t.impliedRateMismatchPct).toBe(15); // section 5a, common practice
    expect(t.minCaptivePreloadMm).toBeGreaterThanOrEqual(2); // section 5e: 2-3 mm, common practice
    expect(t.minCaptivePreloadMm).toBeLessThanOrEqual(3);
    expect(t.adjusterResolution).toEqual({ threaded: 0.25, stepped: 1, spacer: 0.5 }); // section 5f
    expect(t.dampingRatio).toBe(0.3); // section 5i, from memory
  });

  it('name the missing keys when the stored settings are incomplete', () => {
    const partial = engineSettingSeeds.filter((s) => s.key !== 'coilBindMarginMm');
    expect(() => buildWarningThresholds(partial)).toThrow(/coilBindMarginMm/);
  });
});

describe('seeded target profiles (section 6, common practice)', () => {
  const byName = Object.fromEntries(targetProfileSeeds.map((p) => [p.discipline, p]));

  it('cover the disciplines of the spec, each labelled as common practice; a passenger is a load case, not a discipline', () => {
    expect(Object.keys(byName)).toEqual(['road', 'track', 'touring', 'trail', 'motocross']);
    for (const profile of targetProfileSeeds) expect(profile.note).toMatch(/Common practice/);
  });

  it('give windows the engine can aim at', () => {
    for (const profile of targetProfileSeeds) {
      for (const end of [profile.front, profile.rear]) {
        for (const [min, max] of [end.riderSagPct, end.staticSagPct]) {
          expect(min).toBeGreaterThanOrEqual(0);
          expect(max).toBeGreaterThan(min);
          expect(max).toBeLessThanOrEqual(100);
        }
        expect(middle(end.riderSagPct)).toBeGreaterThan(middle(end.staticSagPct));
      }
    }
  });

  it('follow the spec: road 28-33 % rider / 5-12 % static rear, front static larger, track less rider sag', () => {
    expect(byName.road.rear).toEqual({ riderSagPct: [28, 33], staticSagPct: [5, 12] });
    expect(middle(byName.road.front.staticSagPct)).toBeGreaterThan(middle(byName.road.rear.staticSagPct));
    expect(middle(byName.track.rear.riderSagPct)).toBeLessThan(middle(byName.road.rear.riderSagPct));
    expect(byName.touring.rear).toEqual(byName.road.rear);
    for (const offRoad of [byName.trail, byName.motocross]) {
      const [min, max] = offRoad.rear.riderSagPct; // about a third of travel
      expect(min).toBeLessThanOrEqual(100 / 3);
      expect(max).toBeGreaterThanOrEqual(100 / 3);
    }
  });
});

describe('module boundaries', () => {
  const root = join(__dirname, '..', '..', '..', 'shared');
  const sources = (dir: string): string[] =>
    readdirSync(join(root, dir)).filter((f) => f.endsWith('.ts')).map((f) => readFileSync(join(root, dir, f), 'utf8'));

  it('the engine never imports its seed data, mathjs, React, Express or TypeORM', () => {
    for (const text of sources('sizing')) {
      expect(text).not.toMatch(/from '[^']*(seed|mathjs|react|express|typeorm)[^']*'/);
    }
  });

  it('units import mathjs by name only, keeping the web bundle small', () => {
    const text = sources('units').join('\n');
    expect(text).not.toMatch(/import \* as/);
    expect(text).toMatch(/import \{ create, [^}]+ \} from 'mathjs'/);
  });
});
