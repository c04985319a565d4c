/**
 * The seed of the symptom-to-change table and the symptom list hold together (the rows are common
 * practice, no source; these checks are of consistency, not of the advice).
 */
import { DAMPER_KIND_LABELS, damperLabel, SEEDED_DAMPING_RULES, SYMPTOMS, symptomOf } from '@shared/damping';
import { DAMPING_CLAIMS, SYMPTOM_KEYS } from '@shared/types/damping';

const SEEDED_KINDS = ['rebound', 'compression', 'hs-compression', 'ls-compression', 'hs-rebound', 'ls-rebound'];

describe('symptoms', () => {
  it('cover every symptom key once, with words, a situation and at least one end', () => {
    expect(SYMPTOMS.map((symptom) => symptom.key).sort()).toEqual([...SYMPTOM_KEYS].sort());
    for (const symptom of SYMPTOMS) {
      expect(symptom.words.length).toBeGreaterThan(0);
      expect(symptom.situation.length).toBeGreaterThan(0);
      expect(symptom.ends.length).toBeGreaterThan(0);
      expect(symptomOf(symptom.key)).toBe(symptom);
    }
  });

  it('labels: the shop list first, then the trade, then the key in words', () => {
    expect(Object.keys(DAMPER_KIND_LABELS).sort()).toEqual([...SEEDED_KINDS].sort());
    expect(damperLabel('hs-compression')).toBe('High-speed compression');
    expect(damperLabel('hs-compression', [{ key: 'hs-compression', label: 'HSC', circuit: 'compression', speed: 'high' }])).toBe('HSC');
    expect(damperLabel('mid-valve-bleed')).toBe('Mid valve bleed');
  });
});

describe('seeded rules', () => {
  it('have a row for every symptom at every end it applies to, and none at others', () => {
    for (const symptom of SYMPTOMS) {
      for (const end of ['front', 'rear'] as const) {
        const rows = SEEDED_DAMPING_RULES.filter((rule) => rule.symptom === symptom.key && rule.end === end);
        if (symptom.ends.includes(end)) expect(rows.length).toBeGreaterThan(0);
        else expect(rows).toEqual([]);
      }
    }
  });

  it('name only the six seeded kinds, are active common practice, and say why and what to feel for', () => {
    for (const rule of SEEDED_DAMPING_RULES) {
      expect(SEEDED_KINDS).toContain(rule.adjuster);
      expect(rule.source).toBe('common-practice');
      expect(rule.active).toBe(true);
      expect(rule.why.length).toBeGreaterThan(0);
      expect(rule.feelFor.length).toBeGreaterThan(0);
      if (rule.claim !== null) expect(DAMPING_CLAIMS).toContain(rule.claim);
    }
  });

  it('have unique priorities and adjuster-directions per symptom and end', () => {
    const priorities = SEEDED_DAMPING_RULES.map((rule) => `${rule.symptom}|${rule.end}|${rule.priority}`);
    expect(new Set(priorities).size).toBe(priorities.length);
    const moves = SEEDED_DAMPING_RULES.map((rule) => `${rule.symptom}|${rule.end}|${rule.adjuster}|${rule.direction}`);
    expect(new Set(moves).size).toBe(moves.length);
  });
});
