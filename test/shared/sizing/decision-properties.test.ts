/**
 * Properties of the one decision per end (fast-check, over generated bikes, riders and catalogues).
 * The sags are recomputed here from the model at the advised setting, not read back from the
 * answer, so a setting that only the answer claims to be inside its windows fails.
 */
import * as fc from 'fast-check';
import { validateSizingRequest } from '@shared/schemas/sizing.schema';
import { sizeBike } from '@shared/sizing';
import { makeForkModel } from '@shared/sizing/fork';
import { makeShockModel } from '@shared/sizing/shock';
import { makeSpringLaw, type SpringLaw } from '@shared/sizing/spring-law';
import type { EndResult, FrontRequest, RangeMm, RearRequest, SizingRequest } from '@shared/types/sizing';
import { arbitraryCatalogue, arbitraryEdgeRequest, arbitraryRequest, makeContext, thresholds } from './fixtures';

const ends = ['front', 'rear'] as const;
const EDGE = 1e-6;

function inside(sag: number | null, window: RangeMm): boolean {
  return sag !== null && sag >= window.min - EDGE && sag <= window.max + EDGE;
}

function modelOf(request: SizingRequest, end: 'front' | 'rear') {
  return end === 'front' ? makeForkModel(request.front as FrontRequest) : makeShockModel(request.rear as RearRequest);
}

function sagsAt(request: SizingRequest, end: 'front' | 'rear', result: EndResult, spring: SpringLaw, preloadMm: number) {
  const model = modelOf(request, end);
  return {
    rider: model.sagAtLoad(spring, preloadMm, result.loads.staticN + result.loads.riderN),
    static: model.sagAtLoad(spring, preloadMm, result.loads.staticN),
  };
}

/** A position a person can set: on the adjuster's steps counted from the current setting, or at a stop. */
function isSettable(request: FrontRequest | RearRequest, position: number): boolean {
  const { adjuster } = request;
  const min = adjuster.minPosition ?? 0;
  if (position < min - EDGE || position > adjuster.maxPosition + EDGE) return false;
  if (Math.abs(position - min) < EDGE || Math.abs(position - adjuster.maxPosition) < EDGE) return true;
  const steps = (position - adjuster.position) / thresholds.adjusterResolution[adjuster.kind];
  return Math.abs(steps - Math.round(steps)) < 1e-6;
}

const requests = fc.oneof(arbitraryRequest(), arbitraryEdgeRequest());

function forEachEnd(check: (request: SizingRequest, end: 'front' | 'rear', result: EndResult) => void) {
  fc.assert(
    fc.property(requests, arbitraryCatalogue(), (raw, springs) => {
      const validation = validateSizingRequest(raw);
      fc.pre(validation.ok);
      if (!validation.ok) return;
      const request = validation.value;
      const sized = sizeBike(request, makeContext({ springs }));
      for (const end of ends) if (sized[end]) check(request, end, sized[end]!);
    }),
    { numRuns: 600 },
  );
}

describe('the decision (fast-check)', () => {
  it('a keep, marginal or not, is a setting the adjuster can make that puts both sags inside their windows', () => {
    forEachEnd((request, end, result) => {
      const kind = result.decision.kind;
      if (kind !== 'keep' && kind !== 'marginal') return;
      const endRequest = request[end] as FrontRequest | RearRequest;
      const preload = result.preload!;
      expect(isSettable(endRequest, preload.position)).toBe(true);
      const spring = makeSpringLaw(endRequest.rateNmm, endRequest.secondRateNmm, endRequest.breakMm);
      const sags = sagsAt(request, end, result, spring, preload.currentMm + preload.roundedChangeMm);
      expect(inside(sags.rider, result.target.riderSagMm)).toBe(true);
      expect(inside(sags.static, result.target.staticSagMm)).toBe(true);
    });
  });

  it('every spring offered as a fit keeps both windows at a setting the adjuster can make, clear of coil-bind', () => {
    forEachEnd((request, end, result) => {
      const endRequest = request[end] as FrontRequest | RearRequest;
      for (const c of result.recommendation.candidates) {
        if (!c.feasible) continue;
        expect(isSettable(endRequest, c.position as number)).toBe(true);
        expect(c.setPreloadMm as number).toBeGreaterThanOrEqual(thresholds.minCaptivePreloadMm - EDGE);
        expect(c.coilBindMarginMm as number).toBeGreaterThanOrEqual(thresholds.coilBindMarginMm - EDGE);
        const sags = sagsAt(request, end, result, makeSpringLaw(c.rateNmm, c.secondRateNmm, c.breakMm), c.setPreloadMm as number);
        expect(inside(sags.rider, result.target.riderSagMm)).toBe(true);
        expect(inside(sags.static, result.target.staticSagMm)).toBe(true);
      }
      const pick = result.decision.pick;
      if (pick) expect(result.recommendation.candidates.find((c) => c.sku === pick.sku)?.feasible).toBe(true);
    });
  });

  it('never headlines keep while offering a change, and never offers a change without one', () => {
    forEachEnd((_request, _end, result) => {
      const { decision } = result;
      const kinds = decision.steps.map((s) => s.kind);
      const changes = kinds.filter((k) => k === 'fit-spring' || k === 'order-spring' || k === 'spacer');
      switch (decision.kind) {
        case 'keep':
          expect(decision.text.headline).toMatch(/^Keep the /);
          expect(kinds.every((k) => k === 'preload' || k === 'measure-static')).toBe(true);
          expect(decision.pick).toBeNull();
          expect(decision.dampingHint).toBeNull();
          expect(result.verdict).toBe('keep');
          break;
        case 'marginal':
          expect(changes).toEqual([]);
          expect(decision.text.headline).toMatch(/works/);
          expect(result.verdict).toBe('keep');
          break;
        case 'change':
          expect(decision.text.headline).not.toMatch(/^Keep/);
          expect(changes).toHaveLength(1);
          expect(result.verdict).not.toBe('keep');
          for (const step of decision.steps) if (step.kind === 'preload') expect(step.interim).toBe(true);
          break;
        case 'check':
          expect(decision.text.headline).toMatch(/^Check before acting/);
          expect(kinds).toEqual(['remeasure']);
          expect(decision.pick).toBeNull();
          break;
        default:
          expect(decision.steps).toEqual([]);
      }
      if (decision.dampingHint) expect(decision.pick).not.toBeNull();
    });
  });

  it('no advised setting leaves static sag at 0 without saying so', () => {
    forEachEnd((_request, _end, result) => {
      result.decision.steps.forEach((step, i) => {
        if ((step.kind === 'preload' || step.kind === 'fit-spring' || step.kind === 'spacer') && step.setting.staticSagMm === 0) {
          expect(result.decision.text.steps[i]).toMatch(/topped out/);
        }
      });
      if (result.preload?.staticSagAfterMm === 0) expect(result.warnings.map((w) => w.code)).toContain('topped-out');
    });
  });
});
