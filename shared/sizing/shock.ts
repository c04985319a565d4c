/**
 * Rear shock: a constant leverage ratio LR = wheel travel / shock stroke, or a linkage curve x(y).
 * By virtual work the wheel load W balances the shock force F through dx/dy: W = F * x'(y), where
 * F is the spring force plus the gas force (which acts as extra preload of F_gas/k).
 */

import type { RearRequest } from '../types/sizing';
import { acceptFit, clampSag, type EndModel, type SingleRateFit } from './end-model';
import {
  buildLinkageCurve,
  curvatureAt,
  findFirstEquilibrium,
  isRegressive,
  shockAt,
  slopeAt,
} from './linkage-curve';
import { SAME_LENGTH_MM } from './readings';
import { springDeflection, springForce, springRateAt, type SpringLaw } from './spring-law';

export function makeShockModel(rear: RearRequest): EndModel {
  return rear.linkage && rear.linkage.length >= 2 ? makeLinkageModel(rear) : new ConstantRatioModel(rear);
}

// A class rather than an object of closures: a model is made for every sizing.
class ConstantRatioModel implements EndModel {
  readonly end = 'rear';
  readonly travelMm: number;
  readonly springStrokeMm: number;
  readonly springsPerEnd = 1;
  readonly regressive = false;
  readonly fixedRatio = true;
  private readonly lr: number;
  private readonly gas: number;

  constructor(rear: RearRequest) {
    this.lr = rear.wheelTravelMm / rear.shockStrokeMm;
    this.gas = rear.gasForceN ?? 0;
    this.travelMm = rear.wheelTravelMm;
    this.springStrokeMm = rear.shockStrokeMm;
  }

  loadAtSag(spring: SpringLaw, preloadMm: number, sagMm: number): number {
    return (springForce(spring, preloadMm + sagMm / this.lr) + this.gas) / this.lr;
  }

  sagAtLoad(spring: SpringLaw, preloadMm: number, loadN: number): number | null {
    return clampSag(this.lr * (springDeflection(spring, loadN * this.lr - this.gas) - preloadMm), this.travelMm);
  }

  preloadForSag(spring: SpringLaw, loadN: number, sagMm: number): number | null {
    return springDeflection(spring, loadN * this.lr - this.gas) - sagMm / this.lr;
  }

  springDeflectionAt(preloadMm: number, sagMm: number): number {
    return preloadMm + sagMm / this.lr;
  }

  wheelRateAt(spring: SpringLaw, preloadMm: number, sagMm: number): number {
    return springRateAt(spring, preloadMm + sagMm / this.lr) / (this.lr * this.lr);
  }

  fitSingleRate(sagA: number, loadA: number, sagB: number, loadB: number): SingleRateFit | null {
    const { lr, gas } = this;
    const rate = ((loadB - loadA) * lr * lr) / (sagB - sagA);
    return acceptFit(rate, (loadA * lr - gas) / rate - sagA / lr);
  }
}

function makeLinkageModel(rear: RearRequest): EndModel {
  const curve = buildLinkageCurve(rear.linkage ?? []);
  const gas = rear.gasForceN ?? 0;
  const travelMm = rear.wheelTravelMm;
  const loadAtSag = (spring: SpringLaw, preloadMm: number, sagMm: number): number =>
    (springForce(spring, preloadMm + shockAt(curve, sagMm)) + gas) * slopeAt(curve, sagMm);
  const sagAtLoad = (spring: SpringLaw, preloadMm: number, loadN: number): number | null => {
    const sagMm = findFirstEquilibrium(curve, (y) => loadAtSag(spring, preloadMm, y), loadN);
    // The last point may lie a little past the stated travel (the schema allows for reading error).
    return sagMm !== null && sagMm <= travelMm ? sagMm : null;
  };
  return {
    end: 'rear',
    travelMm,
    springStrokeMm: shockAt(curve, travelMm),
    springsPerEnd: 1,
    regressive: isRegressive(curve),
    fixedRatio: false,
    loadAtSag,
    sagAtLoad,
    preloadForSag(spring, loadN, sagMm) {
      const slope = slopeAt(curve, sagMm);
      if (!(slope > 0)) return null;
      const preloadMm = springDeflection(spring, loadN / slope - gas) - shockAt(curve, sagMm);
      // Where x' falls, G can reach W earlier on the way down from full extension: the end then
      // rests there (often topped out), and this preload does not hold it at sagMm.
      const restsAt = sagAtLoad(spring, preloadMm, loadN);
      return restsAt !== null && Math.abs(restsAt - sagMm) <= SAME_LENGTH_MM ? preloadMm : null;
    },
    springDeflectionAt: (preloadMm, sagMm) => preloadMm + shockAt(curve, sagMm),
    wheelRateAt(spring, preloadMm, sagMm) {
      const deflection = preloadMm + shockAt(curve, sagMm);
      const slope = slopeAt(curve, sagMm);
      return (
        springRateAt(spring, deflection) * slope * slope +
        (springForce(spring, deflection) + gas) * curvatureAt(curve, sagMm)
      );
    },
    fitSingleRate(sagA, loadA, sagB, loadB) {
      // W = q*x' + k*x*x' at both sags, with q = k*p + F_gas: a 2x2 linear system in k and q.
      const sa = slopeAt(curve, sagA);
      const sb = slopeAt(curve, sagB);
      const xa = shockAt(curve, sagA);
      const xb = shockAt(curve, sagB);
      const det = sa * sb * (xb - xa);
      if (det === 0) return null;
      const rate = (sa * loadB - sb * loadA) / det;
      const q = (loadA * xb * sb - loadB * xa * sa) / det;
      return acceptFit(rate, (q - gas) / rate);
    },
  };
}
