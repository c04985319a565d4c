/**
 * The bike's load cases on its fitted spring, from its solo setting (sizing.md section 6, "Load
 * cases"). The loads are the latest pass's (calibrated from its readings where it had them); the
 * spring, adjuster and setting are the bike's as it is now, so a spring swapped since the pass is
 * the one the cases are set on.
 */

import { computePreloadRange } from '../sizing/adjuster';
import { findCatalogueTwin } from '../sizing/candidates';
import { makeForkModel } from '../sizing/fork';
import { adviseLoadCases } from '../sizing/load-cases';
import { addedLoadN } from '../sizing/loads';
import { makeShockModel } from '../sizing/shock';
import { isDualRate, makeSpringLaw } from '../sizing/spring-law';
import type { EndModel } from '../sizing/end-model';
import type { BikeSpec } from '../types/bike';
import type { LoadCaseOption } from '../types/load-case';
import type { CatalogueSpring, EndKind, FrontRequest, RearRequest, SizingRequest, SizingResult, WarningThresholds } from '../types/sizing';
import { toFrontRequest, toRearRequest } from './build-sizing-request';

const ENDS: readonly EndKind[] = ['front', 'rear'];

export interface LoadCasePlanInput {
  bike: BikeSpec;
  /** Each end's solo adjuster position; the bike's own where none is given. */
  solo: Partial<Record<EndKind, number>>;
  request: SizingRequest;
  result: SizingResult;
  /** The catalogue springs of each end's fit: a fitted spring's coil-bind length where the bike does not give it. */
  catalogue: Partial<Record<EndKind, readonly CatalogueSpring[]>>;
  thresholds: Pick<WarningThresholds, 'adjusterResolution' | 'minCaptivePreloadMm' | 'coilBindMarginMm' | 'luggageRearShare'>;
}

export function planLoadCases({ bike, solo, request, result, catalogue, thresholds }: LoadCasePlanInput): LoadCaseOption[] {
  const cases = request.loadCases ?? [];
  const options: LoadCaseOption[] = cases.map((c) => ({ name: c.name, massKg: c.massKg, ends: {} }));
  for (const end of ENDS) {
    const spec = bike[end];
    const advised = result[end];
    if (!spec || !advised || advised.decision.kind === 'check' || advised.decision.kind === 'none') continue;
    const position = solo[end] ?? spec.adjuster.position;
    const preloadMm = spec.preloadMm + (position - spec.adjuster.position) * spec.adjuster.mmPerUnit;
    const { request: endRequest, model } = atSolo(bike, end, preloadMm, position);
    const spring = makeSpringLaw(spec.rateNmm, spec.secondRateNmm, spec.breakMm);
    const loads = { staticN: advised.loads.staticN, riderN: advised.loads.riderN };
    const riderSagMm = model.sagAtLoad(spring, preloadMm, loads.staticN + loads.riderN);
    if (riderSagMm === null) continue;
    // As the engine does: the pass's coil-bind length if it was made with this spring, else the catalogue's.
    const passed = request[end];
    const maxDeflectionMm =
      (passed && passed.rateNmm === spec.rateNmm ? passed.maxDeflectionMm : undefined) ?? findCatalogueTwin(catalogue[end] ?? [], spec)?.maxDeflectionMm ?? null;
    const adjusterRange = computePreloadRange(endRequest.adjuster, preloadMm, thresholds.minCaptivePreloadMm);
    const coilLimitMm = maxDeflectionMm === null ? Infinity : maxDeflectionMm - thresholds.coilBindMarginMm - model.springStrokeMm;
    const results = adviseLoadCases(
      model,
      loads,
      {
        spring,
        name: { rateNmm: spec.rateNmm, secondRateNmm: isDualRate(spring) ? spring.secondRateNmm : null },
        position,
        preloadMm,
        riderSagMm,
        grid: {
          adjuster: endRequest.adjuster,
          currentPreloadMm: preloadMm,
          resolution: thresholds.adjusterResolution[spec.adjuster.kind],
          rangeMm: { min: adjusterRange.min, max: Math.min(adjusterRange.max, coilLimitMm) },
        },
        coilLimited: coilLimitMm < adjusterRange.max,
      },
      cases.map((c) => ({ name: c.name, massKg: c.massKg, addedN: addedLoadN(c.massKg, c.rearShare ?? thresholds.luggageRearShare, end) })),
      advised.target,
    );
    results.forEach((r, i) => {
      options[i].ends[end] = r;
    });
  }
  return options.filter((o) => Object.keys(o.ends).length > 0);
}

/** The end's sizing request and model with the adjuster at its solo setting. */
function atSolo(bike: BikeSpec, end: EndKind, preloadMm: number, position: number): { request: FrontRequest | RearRequest; model: EndModel } {
  if (end === 'front') {
    const front = bike.front!;
    const request = toFrontRequest({ ...front, preloadMm, adjuster: { ...front.adjuster, position } });
    return { request, model: makeForkModel(request) };
  }
  const rear = bike.rear!;
  const request = toRearRequest({ ...rear, preloadMm, adjuster: { ...rear.adjuster, position } });
  return { request, model: makeShockModel(request) };
}
