/**
 * Front fork: n sprung legs along an axis raked theta from vertical. Only the axial part
 * W*cos(theta) of a vertical wheel load does spring work; the rest bends the tubes.
 */

import type { FrontRequest } from '../types/sizing';
import { acceptFit, clampSag, type EndModel, type SingleRateFit } from './end-model';
import { springDeflection, springForce, springRateAt, type SpringLaw } from './spring-law';

// A class rather than an object of closures: a model is made for every sizing.
class ForkModel implements EndModel {
  readonly end = 'front';
  readonly travelMm: number;
  readonly springStrokeMm: number;
  readonly springsPerEnd: number;
  readonly regressive = false;
  readonly fixedRatio = true;
  private readonly cos: number;

  constructor(front: FrontRequest) {
    this.travelMm = front.travelMm;
    this.springStrokeMm = front.travelMm;
    this.springsPerEnd = front.springCount;
    this.cos = Math.cos((front.rakeDeg * Math.PI) / 180);
  }

  loadAtSag(spring: SpringLaw, preloadMm: number, sagMm: number): number {
    return (this.springsPerEnd * springForce(spring, preloadMm + sagMm)) / this.cos;
  }

  sagAtLoad(spring: SpringLaw, preloadMm: number, loadN: number): number | null {
    return clampSag(springDeflection(spring, (loadN * this.cos) / this.springsPerEnd) - preloadMm, this.travelMm);
  }

  preloadForSag(spring: SpringLaw, loadN: number, sagMm: number): number | null {
    return springDeflection(spring, (loadN * this.cos) / this.springsPerEnd) - sagMm;
  }

  springDeflectionAt(preloadMm: number, sagMm: number): number {
    return preloadMm + sagMm;
  }

  wheelRateAt(spring: SpringLaw, preloadMm: number, sagMm: number): number {
    return (this.springsPerEnd * springRateAt(spring, preloadMm + sagMm)) / (this.cos * this.cos);
  }

  fitSingleRate(sagA: number, loadA: number, sagB: number, loadB: number): SingleRateFit | null {
    const { cos, springsPerEnd: n } = this;
    const rate = ((loadB - loadA) * cos) / (n * (sagB - sagA));
    return acceptFit(rate, (loadA * cos) / (n * rate) - sagA);
  }
}

export function makeForkModel(front: FrontRequest): EndModel {
  return new ForkModel(front);
}
