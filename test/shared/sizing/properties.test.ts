import * as fc from 'fast-check';
import { validateSizingRequest } from '@shared/schemas/sizing.schema';
import { averageReading, sizeBike } from '@shared/sizing';
import type { FrontRequest, RearRequest, SizingRequest } from '@shared/types/sizing';
import { arbitraryCatalogue, arbitraryEdgeRequest, arbitraryRequest, collectNumbers, makeContext } from './fixtures';

const context = makeContext();

function fromWeights(request: SizingRequest): SizingRequest {
  const copy = structuredClone(request);
  if (copy.front) delete copy.front.readings;
  if (copy.rear) delete copy.rear.readings;
  return copy;
}

const ends = ['front', 'rear'] as const;
const worse = (sag: number | null) => (sag === null ? Number.POSITIVE_INFINITY : sag);

describe('properties of the engine (fast-check)', () => {
  it('every typical generated request is valid, so the properties below cover valid input', () => {
    fc.assert(
      fc.property(arbitraryRequest(), (request) => {
        const validation = validateSizingRequest(request);
        expect(validation.ok ? {} : validation.fields).toEqual({});
      }),
      { numRuns: 300 },
    );
  });

  // The monotony properties also run at the edges of the schema's ranges, where rounding bites first.
  it('from weights, a heavier rider never needs a softer ideal spring', () => {
    fc.assert(
      fc.property(fc.oneof(arbitraryRequest(), arbitraryEdgeRequest()), fc.double({ min: 0, max: 60, noNaN: true }), (request, extraKg) => {
        const light = fromWeights(request);
        const heavy = structuredClone(light);
        heavy.rider.bodyKg += extraKg;
        const a = sizeBike(light, context);
        const b = sizeBike(heavy, context);
        for (const end of ends) {
          const before = a[end]?.idealRateNmm;
          const after = b[end]?.idealRateNmm;
          if (before != null) {
            expect(after).not.toBeNull();
            expect(after as number).toBeGreaterThanOrEqual(before * (1 - 1e-12));
          }
        }
      }),
      { numRuns: 300 },
    );
  });

  it('more preload never gives more sag', () => {
    fc.assert(
      fc.property(fc.oneof(arbitraryRequest(), arbitraryEdgeRequest()), fc.double({ min: 0, max: 20, noNaN: true }), (request, extraMm) => {
        const less = fromWeights(request);
        const more = structuredClone(less);
        for (const end of ends) {
          const e = more[end] as FrontRequest | RearRequest | undefined;
          if (e) e.preloadMm += extraMm;
        }
        const a = sizeBike(less, context);
        const b = sizeBike(more, context);
        for (const end of ends) {
          if (!a[end]) continue;
          expect(worse(b[end]!.staticSagMm)).toBeLessThanOrEqual(worse(a[end]!.staticSagMm) + 1e-9);
          expect(worse(b[end]!.riderSagMm)).toBeLessThanOrEqual(worse(a[end]!.riderSagMm) + 1e-9);
        }
      }),
      { numRuns: 300 },
    );
  });

  it('gives finite numbers everywhere (no NaN, no Infinity) for every valid input', () => {
    // Typical requests, and requests at the edges of every range the schema accepts.
    const requests = fc.oneof(arbitraryRequest(), arbitraryEdgeRequest());
    fc.assert(
      fc.property(requests, arbitraryCatalogue(), (request, springs) => {
        const validation = validateSizingRequest(request);
        fc.pre(validation.ok);
        if (!validation.ok) return;
        const result = sizeBike(validation.value, makeContext({ springs }));
        expect(collectNumbers(result).filter(([, v]) => !Number.isFinite(v))).toEqual([]);
        for (const end of ends) if (request[end]) expect(result[end]).toBeDefined();
      }),
      { numRuns: 1000 },
    );
  });

  it('never advises a setting outside the preload range: the adjuster\'s stops and the captive minimum', () => {
    const requests = fc.oneof(arbitraryRequest(), arbitraryEdgeRequest());
    fc.assert(
      fc.property(requests, arbitraryCatalogue(), (request, springs) => {
        const validation = validateSizingRequest(request);
        fc.pre(validation.ok);
        if (!validation.ok) return;
        const result = sizeBike(validation.value, makeContext({ springs }));
        for (const end of ends) {
          const preload = result[end]?.preload;
          if (!preload || preload.rangeMm.min > preload.rangeMm.max) continue;
          const { min, max } = preload.rangeMm;
          const settings = [preload.currentMm + preload.roundedChangeMm, ...result[end]!.recommendation.candidates.map((c) => c.setPreloadMm)];
          for (const set of settings) {
            if (set === null) continue;
            expect(set).toBeGreaterThanOrEqual(min - 1e-6);
            expect(set).toBeLessThanOrEqual(max + 1e-6);
          }
        }
      }),
      { numRuns: 300 },
    );
  });

  /** One way to break a valid request, and the field path that must then carry a message. */
  type Breakage = [string, (r: SizingRequest) => boolean];
  const breakages: Breakage[] = [
    ['bike.massKg', (r) => (delete (r.bike as Partial<SizingRequest['bike']>).massKg, true)],
    ['bike.massKg', (r) => ((r.bike.massKg = -5), true)],
    ['bike.massKg', (r) => ((r.bike as unknown as Record<string, unknown>).massKg = 'heavy') !== undefined],
    ['bike.massKg', (r) => ((r.bike.massKg = Number.POSITIVE_INFINITY), true)],
    ['bike.frontShare', (r) => ((r.bike.frontShare = 1.4), true)],
    ['rider.rearShare', (r) => ((r.rider.rearShare = -0.1), true)],
    ['rider.bodyKg', (r) => ((r.rider.bodyKg = Number.NaN), true)],
    ['loadCases[0].rearShare', (r) => !!r.loadCases?.length && ((r.loadCases[0].rearShare = 2), true)],
    ['loadCases[1].name', (r) => !!r.loadCases?.length && ((r.loadCases = [r.loadCases[0], { ...r.loadCases[0] }]), true)],
    ['front.rateNmm', (r) => !!r.front && ((r.front.rateNmm = 0.5), true)],
    ['rear.rateNmm', (r) => !!r.rear && ((r.rear.rateNmm = 5), true)],
    ['dampingRatio', (r) => ((r.dampingRatio = 0), true)],
    ['discipline', (r) => ((r.discipline = 'Road Race'), true)],
    ['ends', (r) => (delete r.front, delete r.rear, true)],
    ['front.rateNmm', (r) => !!r.front && ((r.front.rateNmm = 0), true)],
    ['front.springCount', (r) => !!r.front && (((r.front as unknown as Record<string, unknown>).springCount = 3), true)],
    ['front.rakeDeg', (r) => !!r.front && ((r.front.rakeDeg = 70), true)],
    ['front.springType', (r) => !!r.front && (((r.front as unknown as Record<string, unknown>).springType = 'air'), true)],
    ['rear.springType', (r) => !!r.rear && (((r.rear as unknown as Record<string, unknown>).springType = 'air'), true)],
    ['front.breakMm', (r) => !!r.front && (delete r.front.breakMm, (r.front.secondRateNmm = 12), true)],
    [
      'front.readings.staticMm',
      (r) => !!r.front?.readings && ((r.front.readings.staticMm = r.front.readings.extendedMm + 5), true),
    ],
    [
      'front.readings.riderMm',
      (r) => !!r.front?.readings && ((r.front.readings.riderMm = averageReading(r.front.readings.staticMm) + 2), true),
    ],
    [
      'rear.readings.riderMm',
      (r) => !!r.rear?.readings && ((r.rear.readings.riderMm = r.rear.readings.extendedMm - r.rear.wheelTravelMm - 5) > 0),
    ],
    ['front.target.staticSagMm', (r) => !!r.front?.target && ((r.front.target.staticSagMm = r.front.target.riderSagMm + 1), true)],
    ['rear.linkage[0]', (r) => !!r.rear?.linkage && ((r.rear.linkage[0] = [1, 0]), true)],
    ['rear.linkage[1]', (r) => !!r.rear?.linkage && ((r.rear.linkage[1] = [0, 0]), true)],
    [
      'rear.linkage',
      (r) => {
        const linkage = r.rear?.linkage;
        if (!linkage) return false;
        const last = linkage.length - 1;
        linkage[last] = [linkage[last][0] + 20, linkage[last][1]];
        return true;
      },
    ],
    ['rear.adjuster.position', (r) => !!r.rear && ((r.rear.adjuster.position = r.rear.adjuster.maxPosition + 1), true)],
    ['rear.shockStrokeMm', (r) => !!r.rear && (delete r.rear.linkage, (r.rear.shockStrokeMm = r.rear.wheelTravelMm / 7) >= 10)],
  ];

  it('gives a field error at the broken field for every invalid input', () => {
    fc.assert(
      fc.property(arbitraryRequest(), fc.constantFrom(...breakages), (request, [path, breakIt]) => {
        const broken = structuredClone(request);
        fc.pre(breakIt(broken));
        const validation = validateSizingRequest(broken);
        expect(validation.ok).toBe(false);
        if (validation.ok) return;
        // The linkage's last point carries its own index.
        const keys = Object.keys(validation.fields);
        expect(keys.some((k) => k === path || (path === 'rear.linkage' && k.startsWith('rear.linkage[')))).toBe(true);
        for (const message of Object.values(validation.fields)) expect(message.length).toBeGreaterThan(10);
      }),
      { numRuns: 1000 },
    );
  });
});
