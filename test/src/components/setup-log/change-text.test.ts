/** A setup-log change in words, damping adjusters with their units. Values are invented; the wording is the product's. */
import { describeChange } from '@/components/setup-log/change-text';
import { toDisplayUnits } from '@shared/garage/units';

const metric = toDisplayUnits({ system: 'metric', rateUnit: 'N/mm' });

describe('a damping adjuster change', () => {
  it('names the adjuster by its label and counts in its unit', () => {
    expect(describeChange({ end: 'front', setting: 'damper', adjuster: 'rebound', unit: 'clicks', from: 10, to: 12 }, metric, { rebound: 'Rebound' })).toBe('Front rebound 10 → 12 clicks out');
    expect(describeChange({ end: 'rear', setting: 'damper', adjuster: 'hs-compression', unit: 'turns', from: 1.25, to: 1.5 }, metric, { 'hs-compression': 'High-speed compression' })).toBe(
      'Rear high-speed compression 1.25 → 1.5 turns out',
    );
  });

  it('reads a kind off the list as its key, and an adjuster added since as none before', () => {
    expect(describeChange({ end: 'rear', setting: 'damper', adjuster: 'ls-rebound', unit: 'clicks', from: null, to: 1 }, metric)).toBe('Rear ls rebound none → 1 click out');
  });
});
