import { formatPreloadChange, formatTurns } from '@/components/result/preload-text';

describe('preload changes as the rider turns them', () => {
  it('writes quarter turns as fractions', () => {
    expect(formatTurns(1.5)).toBe('1 1/2');
    expect(formatTurns(0.25)).toBe('1/4');
    expect(formatTurns(2.75)).toBe('2 3/4');
    expect(formatTurns(3)).toBe('3');
    expect(formatTurns(0.1)).toBe('0');
  });

  it('says which way and how far for each kind of adjuster', () => {
    expect(formatPreloadChange(1.5, 'turns')).toBe('add 1 1/2 turns');
    expect(formatPreloadChange(-0.75, 'turns')).toBe('remove 3/4 turn');
    expect(formatPreloadChange(1, 'turns')).toBe('add 1 turn');
    expect(formatPreloadChange(-2, 'steps')).toBe('remove 2 steps');
    expect(formatPreloadChange(1, 'steps')).toBe('add 1 step');
    expect(formatPreloadChange(4, 'mm')).toBe('spacer 4 mm longer');
    expect(formatPreloadChange(-2.5, 'mm')).toBe('spacer 2.5 mm shorter');
    expect(formatPreloadChange(0, 'turns')).toBe('keep the setting');
  });
});
