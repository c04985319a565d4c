/** Requests, contexts and generators shared by the sizing tests. */

import * as fc from 'fast-check';
import { buildWarningThresholds } from '@shared/sizing';
import type {
  CatalogueSpring,
  FrontRequest,
  LinkagePoint,
  RearRequest,
  SizingContext,
  SizingRequest,
  TargetProfile,
} from '@shared/types/sizing';
import { engineSettingSeeds, targetProfileSeeds } from '../../../server/seed/sizing-defaults';

export const thresholds = buildWarningThresholds(engineSettingSeeds);

export const roadProfile: TargetProfile = targetProfileSeeds.find((p) => p.discipline === 'road')!;

export function forkSpring(sku: string, rateNmm: number, onHand = 4, reserved = 0): CatalogueSpring {
  return { sku, kind: 'fork', family: 'F43-300', rateNmm, freeLengthMm: 300, maxDeflectionMm: 200, onHand, reserved };
}

export function shockSpring(sku: string, rateNmm: number, onHand = 2, reserved = 0): CatalogueSpring {
  return { sku, kind: 'shock', family: 'S60-180', rateNmm, freeLengthMm: 180, maxDeflectionMm: 90, onHand, reserved };
}

export function makeContext(overrides: Partial<SizingContext> = {}): SizingContext {
  return {
    profile: roadProfile,
    springs: {
      front: [8, 8.5, 9, 9.5, 10, 10.5, 11].map((r) => forkSpring(`F${r}`, r)),
      rear: [100, 110, 120, 130, 140, 150].map((r) => shockSpring(`S${r}`, r)),
    },
    thresholds,
    ...overrides,
  };
}

export function roadFront(overrides: Partial<FrontRequest> = {}): FrontRequest {
  return {
    travelMm: 120,
    springCount: 2,
    rakeDeg: 25,
    rateNmm: 9,
    preloadMm: 8,
    family: 'F43-300',
    adjuster: { kind: 'threaded', mmPerUnit: 1, position: 5, maxPosition: 15 },
    ...overrides,
  };
}

export function roadRear(overrides: Partial<RearRequest> = {}): RearRequest {
  return {
    wheelTravelMm: 125,
    shockStrokeMm: 50,
    gasForceN: 0,
    rateNmm: 120,
    preloadMm: 8,
    family: 'S60-180',
    adjuster: { kind: 'threaded', mmPerUnit: 1.5, position: 5, maxPosition: 12 },
    ...overrides,
  };
}

export function roadRequest(overrides: Partial<SizingRequest> = {}): SizingRequest {
  return {
    discipline: 'road',
    bike: { massKg: 220, frontShare: 0.5, unsprungFrontKg: 20, unsprungRearKg: 25 },
    rider: { bodyKg: 80, gearKg: 8, rearShare: 0.65 },
    front: roadFront(),
    rear: roadRear(),
    ...overrides,
  };
}

/** Every number anywhere in a value, with its path. */
export function collectNumbers(value: unknown, path = '', out: [string, number][] = []): [string, number][] {
  if (typeof value === 'number') out.push([path, value]);
  else if (Array.isArray(value)) value.forEach((v, i) => collectNumbers(v, `${path}[${i}]`, out));
  else if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) collectNumbers(v, path ? `${path}.${k}` : k, out);
  }
  return out;
}

/** A loaded reading at this sag; a pair straddles it, but no reading is longer than the extended one. */
function reading(extendedMm: number, sagMm: number, spreadMm: number, paired: boolean) {
  const half = Math.min(spreadMm / 2, sagMm);
  return paired ? { pushedMm: extendedMm - sagMm - half, liftedMm: extendedMm - sagMm + half } : extendedMm - sagMm;
}

function arbitraryReadings(travelMm: number) {
  return fc
    .record({
      extendedMm: fc.double({ min: 300, max: 900, noNaN: true }),
      staticShare: fc.double({ min: 0, max: 0.6, noNaN: true }),
      riderShare: fc.double({ min: 0, max: 1, noNaN: true }),
      staticSpread: fc.double({ min: 0, max: 12, noNaN: true }),
      riderSpread: fc.double({ min: 0, max: 12, noNaN: true }),
      staticPaired: fc.boolean(),
      riderPaired: fc.boolean(),
    })
    .map((r) => {
      const staticSag = r.staticShare * travelMm;
      const riderSag = staticSag + r.riderShare * (0.95 * travelMm - staticSag);
      return {
        extendedMm: r.extendedMm,
        staticMm: reading(r.extendedMm, staticSag, r.staticSpread, r.staticPaired),
        riderMm: reading(r.extendedMm, riderSag, r.riderSpread, r.riderPaired),
      };
    });
}

function arbitraryAdjuster() {
  return fc
    .record({
      kind: fc.constantFrom('threaded' as const, 'stepped' as const, 'spacer' as const),
      mmPerUnit: fc.double({ min: 0.5, max: 3, noNaN: true }),
      maxPosition: fc.integer({ min: 4, max: 30 }),
      at: fc.double({ min: 0, max: 1, noNaN: true }),
    })
    .map((a) => ({ kind: a.kind, mmPerUnit: a.mmPerUnit, maxPosition: a.maxPosition, position: a.at * a.maxPosition }));
}

function arbitraryTarget(travelMm: number) {
  return fc
    .record({ rider: fc.double({ min: 0.2, max: 0.45, noNaN: true }), stat: fc.double({ min: 0, max: 0.9, noNaN: true }) })
    .map((t) => ({ riderSagMm: t.rider * travelMm, staticSagMm: t.stat * t.rider * travelMm }));
}

/** An increasing linkage curve from [0, 0] to [travel, stroke]; convex or not. */
export function arbitraryLinkage(travelMm: number, strokeMm: number): fc.Arbitrary<LinkagePoint[]> {
  return fc
    .array(fc.record({ dy: fc.double({ min: 0.2, max: 1, noNaN: true }), slope: fc.double({ min: 0.3, max: 1, noNaN: true }) }), {
      minLength: 1,
      maxLength: 7,
    })
    .map((steps) => {
      const wheel = [0];
      const shock = [0];
      for (const s of steps) {
        wheel.push(wheel[wheel.length - 1] + s.dy);
        shock.push(shock[shock.length - 1] + s.dy * s.slope);
      }
      const wy = travelMm / wheel[wheel.length - 1];
      const sx = strokeMm / shock[shock.length - 1];
      const points = wheel.map((y, i): LinkagePoint => [y * wy, shock[i] * sx]);
      points[points.length - 1] = [travelMm, strokeMm];
      return points;
    });
}

function arbitraryFront(): fc.Arbitrary<FrontRequest> {
  return fc.double({ min: 80, max: 300, noNaN: true }).chain((travelMm) =>
    fc.record(
      {
        travelMm: fc.constant(travelMm),
        springCount: fc.constantFrom(1 as const, 2 as const),
        rakeDeg: fc.double({ min: 0, max: 35, noNaN: true }),
        rateNmm: fc.double({ min: 3, max: 25, noNaN: true }),
        preloadMm: fc.double({ min: 0, max: 40, noNaN: true }),
        family: fc.constant('F'),
        adjuster: arbitraryAdjuster(),
        readings: arbitraryReadings(travelMm),
        target: arbitraryTarget(travelMm),
        secondRateNmm: fc.double({ min: 4, max: 30, noNaN: true }),
        breakMm: fc.double({ min: 10, max: 120, noNaN: true }),
      },
      { requiredKeys: ['travelMm', 'springCount', 'rakeDeg', 'rateNmm', 'preloadMm', 'family', 'adjuster'] },
    ).map((front) => {
      // A second rate only with its break point.
      if ((front.secondRateNmm === undefined) !== (front.breakMm === undefined)) {
        const { secondRateNmm: _s, breakMm: _b, ...single } = front;
        return single;
      }
      return front;
    }),
  );
}

function arbitraryRear(): fc.Arbitrary<RearRequest> {
  return fc
    .record({ travel: fc.double({ min: 80, max: 290, noNaN: true }), ratio: fc.double({ min: 1.5, max: 3.5, noNaN: true }) })
    .chain(({ travel, ratio }) =>
      fc.record(
        {
          wheelTravelMm: fc.constant(travel),
          shockStrokeMm: fc.constant(travel / ratio),
          gasForceN: fc.double({ min: 0, max: 400, noNaN: true }),
          linkage: arbitraryLinkage(travel, travel / ratio),
          rateNmm: fc.double({ min: 20, max: 250, noNaN: true }),
          preloadMm: fc.double({ min: 0, max: 30, noNaN: true }),
          family: fc.constant('S'),
          adjuster: arbitraryAdjuster(),
          readings: arbitraryReadings(travel),
          target: arbitraryTarget(travel),
        },
        { requiredKeys: ['wheelTravelMm', 'shockStrokeMm', 'rateNmm', 'preloadMm', 'family', 'adjuster'] },
      ),
    );
}

/** Requests the schema accepts, across both modes and every optional part. */
export function arbitraryRequest(): fc.Arbitrary<SizingRequest> {
  return fc
    .record({
      massKg: fc.double({ min: 60, max: 500, noNaN: true }),
      frontShare: fc.double({ min: 0.3, max: 0.65, noNaN: true }),
      unsprungShare: fc.double({ min: 0.02, max: 0.4, noNaN: true }),
      bodyKg: fc.double({ min: 20, max: 200, noNaN: true }),
      gearKg: fc.double({ min: 0, max: 40, noNaN: true }),
      luggageKg: fc.double({ min: 0, max: 150, noNaN: true }),
      rearShare: fc.double({ min: 0, max: 1, noNaN: true }),
      luggageRearShare: fc.option(fc.double({ min: 0, max: 1.5, noNaN: true }), { nil: undefined }),
      front: fc.option(arbitraryFront(), { nil: undefined }),
      rear: fc.option(arbitraryRear(), { nil: undefined }),
      dampingRatio: fc.option(fc.double({ min: 0.05, max: 3, noNaN: true }), { nil: undefined }),
    })
    .filter((r) => r.front !== undefined || r.rear !== undefined)
    .map((r) => {
      const request: SizingRequest = {
        discipline: 'road',
        bike: {
          massKg: r.massKg,
          frontShare: r.frontShare,
          unsprungFrontKg: r.unsprungShare * r.massKg * r.frontShare,
          unsprungRearKg: r.unsprungShare * r.massKg * (1 - r.frontShare),
        },
        rider: { bodyKg: r.bodyKg, gearKg: r.gearKg, rearShare: r.rearShare },
      };
      if (r.luggageKg > 0) request.loadCases = [{ name: 'With passenger', massKg: r.luggageKg, ...(r.luggageRearShare !== undefined ? { rearShare: r.luggageRearShare } : {}) }];
      if (r.front) request.front = r.front;
      if (r.rear) request.rear = r.rear;
      if (r.dampingRatio !== undefined) request.dampingRatio = r.dampingRatio;
      return request;
    });
}

/** A catalogue around the rates a request is likely to need. */
export function arbitraryCatalogue(): fc.Arbitrary<SizingContext['springs']> {
  return fc.record({
    front: fc.array(
      fc.record({ rate: fc.double({ min: 3, max: 25, noNaN: true }), onHand: fc.nat(6), reserved: fc.nat(2) }).map((s) => forkSpring(`F${s.rate}`, s.rate, s.onHand + s.reserved, s.reserved)),
      { maxLength: 8 },
    ),
    rear: fc.array(
      fc.record({ rate: fc.double({ min: 20, max: 250, noNaN: true }), onHand: fc.nat(6), reserved: fc.nat(2) }).map((s) => shockSpring(`S${s.rate}`, s.rate, s.onHand + s.reserved, s.reserved)),
      { maxLength: 8 },
    ),
  });
}

/** A number at either end of a range or anywhere inside it. */
function edge(min: number, max: number): fc.Arbitrary<number> {
  return fc.oneof(fc.constant(min), fc.constant(max), fc.double({ min, max, noNaN: true }));
}

function arbitraryEdgeReadings(travelMm: number) {
  return fc
    .record({ extendedMm: edge(travelMm + 1, 2000), staticShare: edge(0, 1), riderShare: edge(0, 1), spread: edge(0, 1), paired: fc.boolean() })
    .map((r) => {
      const staticSag = r.staticShare * travelMm;
      const riderSag = staticSag + r.riderShare * (travelMm - staticSag);
      const spread = r.spread * Math.min(r.extendedMm - riderSag - 0.5, 40);
      return {
        extendedMm: r.extendedMm,
        staticMm: reading(r.extendedMm, staticSag, spread, r.paired),
        riderMm: reading(r.extendedMm, riderSag, spread, !r.paired),
      };
    });
}

function arbitraryEdgeAdjuster() {
  return fc
    .record({
      kind: fc.constantFrom('threaded' as const, 'stepped' as const, 'spacer' as const),
      mmPerUnit: edge(0.001, 50),
      minPosition: edge(-1000, 999),
      span: edge(0.001, 1),
      at: edge(0, 1),
    })
    .map((a) => {
      const maxPosition = a.minPosition + a.span * (1000 - a.minPosition);
      return { kind: a.kind, mmPerUnit: a.mmPerUnit, minPosition: a.minPosition, maxPosition, position: a.minPosition + a.at * (maxPosition - a.minPosition) };
    });
}

/** Requests at the edges of every range the schema accepts. */
export function arbitraryEdgeRequest(): fc.Arbitrary<SizingRequest> {
  const front = edge(30, 350).chain((travelMm) =>
    fc.record(
      {
        travelMm: fc.constant(travelMm),
        springCount: fc.constantFrom(1 as const, 2 as const),
        rakeDeg: edge(0, 45),
        rateNmm: edge(1, 50),
        preloadMm: edge(0, 100),
        family: fc.constant('F'),
        adjuster: arbitraryEdgeAdjuster(),
        readings: arbitraryEdgeReadings(travelMm),
        target: fc.record({ rider: edge(0.001, 1), stat: edge(0, 0.999) }).map((t) => ({ riderSagMm: t.rider * travelMm, staticSagMm: t.stat * t.rider * travelMm })),
      },
      { requiredKeys: ['travelMm', 'springCount', 'rakeDeg', 'rateNmm', 'preloadMm', 'family', 'adjuster'] },
    ),
  );
  const rear = fc.record({ travel: edge(30, 400), ratio: edge(0.5, 6) }).chain(({ travel, ratio }) => {
    const stroke = Math.min(200, Math.max(10, travel / ratio));
    return fc.record(
      {
        wheelTravelMm: fc.constant(travel),
        shockStrokeMm: fc.constant(stroke),
        gasForceN: edge(0, 2000),
        linkage: arbitraryLinkage(travel, stroke),
        rateNmm: edge(10, 500),
        preloadMm: edge(0, 100),
        family: fc.constant('S'),
        adjuster: arbitraryEdgeAdjuster(),
        readings: arbitraryEdgeReadings(travel),
      },
      { requiredKeys: ['wheelTravelMm', 'shockStrokeMm', 'rateNmm', 'preloadMm', 'family', 'adjuster'] },
    );
  });
  return fc
    .record({
      massKg: edge(30, 700),
      frontShare: edge(0, 1),
      unsprungFront: edge(0, 0.999),
      unsprungRear: edge(0, 0.999),
      bodyKg: edge(20, 300),
      gearKg: edge(0, 80),
      luggageKg: edge(0, 300),
      rearShare: edge(0, 1),
      luggageRearShare: fc.option(edge(0, 1.5), { nil: undefined }),
      front: fc.option(front, { nil: undefined }),
      rear: fc.option(rear, { nil: undefined }),
      dampingRatio: fc.option(edge(0.001, 3), { nil: undefined }),
    })
    .filter((r) => r.front !== undefined || r.rear !== undefined)
    .map((r) => {
      const request: SizingRequest = {
        discipline: 'road',
        bike: {
          massKg: r.massKg,
          frontShare: r.frontShare,
          unsprungFrontKg: Math.min(150, r.unsprungFront * r.massKg * r.frontShare),
          unsprungRearKg: Math.min(150, r.unsprungRear * r.massKg * (1 - r.frontShare)),
        },
        rider: { bodyKg: r.bodyKg, gearKg: r.gearKg, rearShare: r.rearShare },
      };
      if (r.luggageKg > 0) request.loadCases = [{ name: 'With passenger', massKg: r.luggageKg, ...(r.luggageRearShare !== undefined ? { rearShare: r.luggageRearShare } : {}) }];
      if (r.front) request.front = r.front;
      if (r.rear) request.rear = r.rear;
      if (r.dampingRatio !== undefined) request.dampingRatio = r.dampingRatio;
      return request;
    });
}
