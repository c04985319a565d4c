/**
 * The engine's entry point: both ends of one bike for one rider. Pure and allocation-light, as
 * the server sizes many quotes and the client re-sizes on every keystroke.
 */

import type { EndKind, SizingContext, SizingRequest, SizingResult } from '../types/sizing';
import { makeForkModel } from './fork';
import type { LoadCaseInput } from './load-cases';
import { addedLoadN, computeIntakeLoads } from './loads';
import { checkIntakePlausibility } from './plausibility';
import { makeShockModel } from './shock';
import { sizeEnd } from './size-end';
import { ENGINE_VERSION } from './version';

export function sizeBike(request: SizingRequest, context: SizingContext): SizingResult {
  const thresholds = context.thresholds;
  const sharedWarnings = checkIntakePlausibility(request, thresholds);
  const dampingRatio = request.dampingRatio ?? thresholds.dampingRatio;
  const result: SizingResult = {
    engineVersion: ENGINE_VERSION,
    discipline: context.profile.discipline,
    profileLabel: context.profile.label,
  };
  if (request.front) {
    result.front = sizeEnd(
      {
        end: 'front',
        model: makeForkModel(request.front),
        request: request.front,
        intakeLoads: computeIntakeLoads(request.bike, request.rider, 'front'),
        windowsPct: context.profile.front,
        springs: context.springs.front,
        loadCases: loadCasesOn(request, 'front', thresholds.luggageRearShare),
        dampingRatio,
        sharedWarnings,
      },
      context,
    );
  }
  if (request.rear) {
    result.rear = sizeEnd(
      {
        end: 'rear',
        model: makeShockModel(request.rear),
        request: request.rear,
        intakeLoads: computeIntakeLoads(request.bike, request.rider, 'rear'),
        windowsPct: context.profile.rear,
        springs: context.springs.rear,
        loadCases: loadCasesOn(request, 'rear', thresholds.luggageRearShare),
        dampingRatio,
        sharedWarnings,
      },
      context,
    );
  }
  return result;
}

function loadCasesOn(request: SizingRequest, end: EndKind, defaultRearShare: number): LoadCaseInput[] {
  return (request.loadCases ?? []).map((c) => ({
    name: c.name,
    massKg: c.massKg,
    addedN: addedLoadN(c.massKg, c.rearShare ?? defaultRearShare, end),
  }));
}
