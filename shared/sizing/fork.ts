/**
 * Front fork: n sprung legs along an axis raked theta from vertical. Only the axial part
 * W*cos(theta) of a vertical wheel load does spring work; the rest bends the tubes.
 */

import type { FrontRequest } from '../types/sizing';
import { acceptFit, clampSag, type EndModel } from './end-model';
import { springDeflection, springForce, springRateAt } from './spring-law';

export function makeForkModel(front: FrontRequest): EndModel {
  const n = front.springCount;
  const cos = Math.cos((front.rakeDeg * Math.PI) / 180);
  const travelMm = front.travelMm;
  return {
    end: 'front',
    travelMm,
    springStrokeMm: travelMm,
    springsPerEnd: n,
    regressive: false,
    loadAtSag: (spring, preloadMm, sagMm) => (n * springForce(spring, preloadMm + sagMm)) / cos,
    sagAtLoad: (spring, preloadMm, loadN) =>
      clampSag(springDeflection(spring, (loadN * cos) / n) - preloadMm, travelMm),
    preloadForSag: (spring, loadN, sagMm) => springDeflection(spring, (loadN * cos) / n) - sagMm,
    springDeflectionAt: (preloadMm, sagMm) => preloadMm + sagMm,
    wheelRateAt: (spring, preloadMm, sagMm) =>
      (n * springRateAt(spring, preloadMm + sagMm)) / (cos * cos),
    fitSingleRate(sagA, loadA, sagB, loadB) {
      const rate = ((loadB - loadA) * cos) / (n * (sagB - sagA));
      return acceptFit(rate, (loadA * cos) / (n * rate) - sagA);
    },
  };
}
