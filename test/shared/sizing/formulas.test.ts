import { rankCandidates } from '@shared/sizing/candidates';
import { makeForkModel } from '@shared/sizing/fork';
import { addedLoadN, calibrateLoads, computeIntakeLoads, STANDARD_GRAVITY } from '@shared/sizing/loads';
import { computeDampingRatioScale, computeRideFrequencyHz } from '@shared/sizing/ride-frequency';
import type { SettableGrid } from '@shared/sizing/settable-setting';
import { makeShockModel } from '@shared/sizing/shock';
import { assessSpring } from '@shared/sizing/spring-assessment';
import { makeSpringLaw, secantRate, springDeflection, springForce } from '@shared/sizing/spring-law';
import type { SagWindows } from '@shared/sizing/targets';
import { forkSpring, roadFront, roadRear, shockSpring, thresholds } from './fixtures';

/** Windows of the given half-widths around a rider-sag and a static-sag middle. */
function windowsAround(riderMm: number, riderHalfMm: number, staticMm: number, staticHalfMm: number): SagWindows {
  return {
    source: 'request',
    riderSagMm: { min: riderMm - riderHalfMm, max: riderMm + riderHalfMm },
    staticSagMm: { min: staticMm - staticHalfMm, max: staticMm + staticHalfMm },
    riderMiddleMm: riderMm,
    staticMiddleMm: staticMm,
  };
}

const g = 9.80665; // standard gravity, exact (CGPM 1901; NIST SP 811)

describe('loads (section 2)', () => {
  it('standard gravity is 9.80665 m/s^2 (CGPM 1901, NIST SP 811)', () => {
    expect(STANDARD_GRAVITY).toBe(9.80665);
  });

  it('splits the bike and the solo rider between the wheels', () => {
    const bike = { massKg: 200, frontShare: 0.5, unsprungFrontKg: 20, unsprungRearKg: 25 };
    const rider = { bodyKg: 80, gearKg: 10, rearShare: 0.6 };
    const front = computeIntakeLoads(bike, rider, 'front');
    const rear = computeIntakeLoads(bike, rider, 'rear');
    // W_SF = (200*0.5 - 20)*g = 80 g = 784.532 N; W_SR = (200*0.5 - 25)*g = 75 g = 735.49875 N.
    expect(front.staticN).toBeCloseTo(784.532, 9);
    expect(rear.staticN).toBeCloseTo(735.49875, 9);
    // W_RF = 90*0.4*g = 36 g = 353.0394 N; W_RR = 90*0.6*g = 54 g = 529.5591 N.
    expect(front.riderN).toBeCloseTo(353.0394, 9);
    expect(rear.riderN).toBeCloseTo(529.5591, 9);
  });

  it('a carried load adds its share to each wheel; a top box behind the axle unloads the front', () => {
    // 20 kg at a rear share of 1.2: front 20*(1 - 1.2)*g = -4 g = -39.2266 N, rear 24 g = 235.3596 N.
    expect(addedLoadN(20, 1.2, 'front')).toBeCloseTo(-39.2266, 9);
    expect(addedLoadN(20, 1.2, 'rear')).toBeCloseTo(235.3596, 9);
    // A 75 kg passenger at 0.95: rear 71.25 g = 698.7238 N, front 3.75 g = 36.7749 N.
    expect(addedLoadN(75, 0.95, 'rear')).toBeCloseTo(698.72381, 5);
    expect(addedLoadN(75, 0.95, 'front')).toBeCloseTo(36.77494, 5);
  });
});

describe('front fork (section 3)', () => {
  const fork = makeForkModel(roadFront({ springCount: 2, rakeDeg: 25 }));
  const spring = makeSpringLaw(9);

  it('sag s = W*cos(theta)/(n*k) - p', () => {
    // W = 80 g = 784.532 N: 784.532 * 0.9063078 / (2*9) - 5 = 39.50153 - 5 = 34.50153 mm.
    expect(fork.sagAtLoad(spring, 5, 80 * g)).toBeCloseTo(34.50153, 5);
    // Rider aboard, W = 112 g = 1098.3448 N: 1098.3448 * 0.9063078 / 18 - 5 = 50.30214 mm.
    expect(fork.sagAtLoad(spring, 5, 112 * g)).toBeCloseTo(50.30214, 5);
    // Preload holds it topped out: 100 * 0.9063 / 18 = 5.04 mm < 8 mm of preload.
    expect(fork.sagAtLoad(spring, 8, 100)).toBe(0);
  });

  it('vertical wheel rate k_w = n*k/cos(theta)^2', () => {
    // 18 / 0.9063078^2 = 18 / 0.8213938 = 21.91397 N/mm.
    expect(fork.wheelRateAt(spring, 5, 30)).toBeCloseTo(21.91397, 5);
  });

  it('implied rate k_imp = W_R*cos(theta)/(n*(S_R - S_S))', () => {
    // W_R = 32 g = 313.8128 N, S_R - S_S = 14 mm: 313.8128 * 0.9063078 / 28 = 10.15754 N/mm.
    const fit = fork.fitSingleRate(25, 80 * g, 39, 112 * g);
    expect(fit?.rateNmm).toBeCloseTo(10.15754, 5);
  });

  it('calibrated loads W_S*cos = n*k0*(S_S + p0), W_R*cos = n*k0*(S_R - S_S)', () => {
    // k0 = 9, p0 = 5, S_S = 25, S_R = 37: W_S = 18*30/0.9063078 = 595.8241 N; W_R = 18*12/0.9063078 = 238.3296 N.
    const loads = calibrateLoads(fork, spring, 5, 25, 37);
    expect(loads?.staticN).toBeCloseTo(595.8241, 4);
    expect(loads?.riderN).toBeCloseTo(238.3296, 4);
  });

  it('ideal rate k* = W_R*cos(theta)/(n*(S* - T*))', () => {
    // W_R = 32 g, S* = 36, T* = 22: 313.8128 * 0.9063078 / (2*14) = 10.15754 N/mm.
    const fit = fork.fitSingleRate(22, 80 * g, 36, 112 * g);
    expect(fit?.rateNmm).toBeCloseTo(10.15754, 5);
    // and with measurements it equals k0*(S_R - S_S)/(S* - T*): 9 * 20 / 14 = 12.857 N/mm.
    const calibrated = calibrateLoads(fork, spring, 5, 20, 40)!;
    const ideal = fork.fitSingleRate(22, calibrated.staticN, 36, calibrated.staticN + calibrated.riderN);
    expect(ideal?.rateNmm).toBeCloseTo((9 * 20) / 14, 9);
  });

  it('a dual-rate spring: rate k1 up to the break, k2 beyond', () => {
    // k1 = 6, k2 = 10, break 40 mm: F(40) = 240 N, F(66) = 240 + 10*26 = 500 N.
    const dual = makeSpringLaw(6, 10, 40);
    expect(springForce(dual, 30)).toBeCloseTo(180, 12);
    expect(springForce(dual, 66)).toBeCloseTo(500, 12);
    expect(springDeflection(dual, 500)).toBeCloseTo(66, 12);
    // Over 30..66 mm it averages (500 - 180) / 36 = 8.889 N/mm.
    expect(secantRate(dual, 30, 66)).toBeCloseTo(320 / 36, 12);
    // n = 2, rake 0, p = 10, W = 1000 N: 500 N per spring is past the break, deflection 66, sag 56 mm.
    const upright = makeForkModel(roadFront({ springCount: 2, rakeDeg: 0, travelMm: 150 }));
    expect(upright.sagAtLoad(dual, 10, 1000)).toBeCloseTo(56, 12);
    expect(upright.preloadForSag(dual, 1000, 56)).toBeCloseTo(10, 12);
    expect(upright.wheelRateAt(dual, 10, 56)).toBeCloseTo(20, 12); // n*k2 = 2 * 10
  });
});

describe('rear shock (section 4)', () => {
  // LR = 125 / 50 = 2.5.
  const shock = makeShockModel(roadRear({ wheelTravelMm: 125, shockStrokeMm: 50, gasForceN: 0 }));
  const spring = makeSpringLaw(95);

  it('wheel sag s = LR*(W*LR/k - p)', () => {
    // W = 75 g = 735.49875 N: 2.5 * (735.49875*2.5/95 - 8) = 2.5 * (19.35523 - 8) = 28.38808 mm.
    expect(shock.sagAtLoad(spring, 8, 75 * g)).toBeCloseTo(28.38808, 5);
  });

  it('gas force acts as extra preload F_gas/k', () => {
    // 200 N of gas on 95 N/mm is 2.10526 mm of preload: 2.5 * ((735.49875*2.5 - 200)/95 - 8) = 23.12492 mm.
    const gassed = makeShockModel(roadRear({ wheelTravelMm: 125, shockStrokeMm: 50, gasForceN: 200 }));
    expect(gassed.sagAtLoad(spring, 8, 75 * g)).toBeCloseTo(23.12492, 5);
    expect(gassed.sagAtLoad(spring, 8 + 200 / 95, 75 * g)).toBeCloseTo(shock.sagAtLoad(spring, 8 + 400 / 95, 75 * g) as number, 9);
  });

  it('vertical wheel rate k_w = k/LR^2', () => {
    expect(shock.wheelRateAt(spring, 8, 30)).toBeCloseTo(15.2, 12); // 95 / 6.25
  });

  it('implied rate k_imp = W_R*LR^2/(S_R - S_S)', () => {
    // W_R = 78 g = 764.9187 N, S_R - S_S = 50 mm: 764.9187 * 6.25 / 50 = 95.61484 N/mm.
    expect(shock.fitSingleRate(10, 75 * g, 60, 153 * g)?.rateNmm).toBeCloseTo(95.61484, 5);
  });

  it('calibrated loads W_S = k0*(S_S/LR + p0)/LR, W_R = k0*(S_R - S_S)/LR^2', () => {
    // k0 = 95, p0 = 8, S_S = 10, S_R = 40: W_S = 95*(4 + 8)/2.5 = 456 N; W_R = 95*30/6.25 = 456 N.
    const loads = calibrateLoads(shock, spring, 8, 10, 40);
    expect(loads?.staticN).toBeCloseTo(456, 9);
    expect(loads?.riderN).toBeCloseTo(456, 9);
  });

  it('ideal rate k* = W_R*LR^2/(S* - T*)', () => {
    // W_R = 78 g, S* = 38, T* = 10: 764.9187 * 6.25 / 28 = 170.74078 N/mm.
    expect(shock.fitSingleRate(10, 75 * g, 38, 153 * g)?.rateNmm).toBeCloseTo(170.74078, 5);
  });

  it('bottoms out (null) when the load would need more than the travel', () => {
    // 2.5 * (3000*2.5/95 - 8) = 177.4 mm > 125 mm of travel.
    expect(shock.sagAtLoad(spring, 8, 3000)).toBeNull();
  });
});

describe('verdict with target windows (section 5c)', () => {
  // Upright fork for round numbers: n = 2, rake 0, W_S = 720 N, W_R = 360 N, road windows on 120 mm.
  const fork = makeForkModel(roadFront({ springCount: 2, rakeDeg: 0, travelMm: 120 }));
  const loads = { staticN: 720, riderN: 360 };
  const windows: SagWindows = {
    source: 'profile',
    riderSagMm: { min: 33.6, max: 39.6 }, // 28-33 % of 120 mm
    staticSagMm: { min: 18, max: 26.4 }, // 15-22 % of 120 mm
    riderMiddleMm: 36.6,
    staticMiddleMm: 22.2,
  };
  /** A spacer adjuster read in mm of preload (position = preload), set in 0.5 mm steps, with the given top. */
  const spacer = (maxMm = 60): SettableGrid => ({
    adjuster: { kind: 'spacer', mmPerUnit: 1, position: 10, maxPosition: maxMm },
    currentPreloadMm: 10,
    resolution: 0.5,
    rangeMm: { min: 2, max: maxMm },
  });
  // The spring serves when S_R - S_S = W_R/(n*k) lies in [33.6 - 26.4, 39.6 - 18] = [7.2, 21.6] mm.

  it('keeps a 10 N/mm spring (difference 360/20 = 18 mm) and aims at the middle', () => {
    const a = assessSpring(fork, makeSpringLaw(10), loads, windows, spacer());
    expect(a.rateFit).toBe('suits');
    // p = (W_S + W_R)/(n*k) - S* = 1080/20 - 36.6 = 17.4 mm; static then 36 - 17.4 = 18.6 mm, inside.
    expect(a.windowsAimMm).toBeCloseTo(17.4, 12);
    // Set in half millimetres: 17.5 mm gives rider sag 36.5 mm (0.1 from the middle), static 18.5 mm.
    expect(a.setting).toMatchObject({ fit: 'both', position: 17.5 });
    expect(a.setting?.riderSagMm).toBeCloseTo(36.5, 12);
    expect(a.setting?.staticSagMm).toBeCloseTo(18.5, 12);
  });

  it('moves the aim to the nearest rider sag that keeps static sag in (9 N/mm: difference 20 mm)', () => {
    // At S* = 36.6 static would be 16.6 < 18: aim at 18 + 20 = 38 mm, p = 1080/18 - 38 = 22 mm.
    const a = assessSpring(fork, makeSpringLaw(9), loads, windows, spacer());
    expect(a.rateFit).toBe('suits');
    expect(a.windowsAimMm).toBeCloseTo(22, 9);
    expect(a.setting?.riderSagMm).toBeCloseTo(38, 9);
    expect(a.setting?.staticSagMm).toBeCloseTo(18, 9);
  });

  it('calls 8 N/mm too soft (22.5 mm > 21.6) and 30 N/mm too stiff (6 mm < 7.2), and sets each at its best compromise', () => {
    const soft = assessSpring(fork, makeSpringLaw(8), loads, windows, spacer());
    expect(soft.rateFit).toBe('too-soft');
    // A soft spring keeps static sag at its window's minimum: p = 720/16 - 18 = 27 mm, rider 67.5 - 27 = 40.5 mm.
    expect(soft.setting).toMatchObject({ fit: 'static', position: 27 });
    expect(soft.setting?.riderSagMm).toBeCloseTo(40.5, 12);
    const stiff = assessSpring(fork, makeSpringLaw(30), loads, windows, spacer());
    expect(stiff.rateFit).toBe('too-stiff');
    // A stiff one is set for the deepest rider sag it allows: with k = 30 rider sag is 18 - p, short of its window
    // at any preload, so the captive minimum, 2 mm: rider 16 mm, static 12 - 2 = 10 mm (neither window, off the stops).
    expect(stiff.setting).toMatchObject({ fit: 'off', position: 2 });
  });

  it('sets inside the adjuster\'s range before calling preload out of range', () => {
    // With at most 15 mm of preload, rider sag is at least 54 - 15 = 39 mm: still inside, so keep at 15.
    const limited = assessSpring(fork, makeSpringLaw(10), loads, windows, spacer(15));
    expect(limited.setting).toMatchObject({ fit: 'both', position: 15 });
    expect(limited.setting?.riderSagMm).toBeCloseTo(39, 9);
    // At most 10 mm: rider sag at least 44 mm, beyond the 39.6 mm window, though the rate suits.
    const short = assessSpring(fork, makeSpringLaw(10), loads, windows, spacer(10));
    expect(short.rateFit).toBe('suits');
    expect(short.setting?.fit).toBe('static');
  });
});

describe('candidate springs (section 5e)', () => {
  it('rear: p = (W_S+W_R)*LR/k - S*/LR, static = W_S*LR^2/k - LR*p, coil-bind margin', () => {
    const shock = makeShockModel(roadRear({ wheelTravelMm: 125, shockStrokeMm: 50, gasForceN: 0 }));
    const ranked = rankCandidates(
      shock,
      [shockSpring('S100', 100)],
      { staticN: 456, riderN: 456 },
      {
        adjuster: { kind: 'threaded', mmPerUnit: 1.5, position: 4, maxPosition: 12 },
        currentPreloadMm: 6,
        preloadRangeMm: { min: 2, max: 18 },
        windows: windowsAround(38, 3, 10, 5),
      },
      thresholds,
    );
    const pick = ranked.candidates[0];
    // p = 912*2.5/100 - 38/2.5 = 22.8 - 15.2 = 7.6 mm (unrounded static would be 456*6.25/100 - 2.5*7.6 = 9.5 mm).
    expect(pick.preloadMm).toBeCloseTo(7.6, 12);
    // (7.6 - 6)/1.5 = 1.0667 turns, rounded to a quarter: 1 turn, position 5, so 6 + 1.5 = 7.5 mm is set
    // (1.25 turns would give 7.875 mm and rider sag 37.31 mm, further from the 38 mm middle).
    expect(pick.preloadUnits).toBe(1);
    expect(pick.position).toBe(5);
    expect(pick.setPreloadMm).toBeCloseTo(7.5, 12);
    // The sags of that setting: rider 2.5*(22.8 - 7.5) = 38.25 mm, static 2.5*(11.4 - 7.5) = 9.75 mm.
    expect(pick.riderSagMm).toBeCloseTo(38.25, 12);
    expect(pick.staticSagMm).toBeCloseTo(9.75, 12);
    expect(pick.riderSagPct).toBeCloseTo(30.6, 12); // 38.25 / 125
    // Coil-bind margin at that setting: 90 mm max deflection - (7.5 + 50 mm stroke) = 32.5 mm.
    expect(pick.coilBindMarginMm).toBeCloseTo(32.5, 12);
    expect(pick.toppedOut).toBe(false);
    expect(pick.feasible).toBe(true);
  });

  it('fork: p = (W_S+W_R)*cos/(n*k) - S*, static = W_S*cos/(n*k) - p; ranked by fit, closeness to the middles, then stock', () => {
    const fork = makeForkModel(roadFront({ springCount: 2, rakeDeg: 0, travelMm: 120 }));
    const springs = [
      forkSpring('F8', 8),
      forkSpring('F10-a', 10, 1), // one spring: a fork with two legs needs two
      forkSpring('F10-b', 10, 5, 3), // 2 free after reservations
      forkSpring('F12', 12),
      forkSpring('F40', 40),
    ];
    const ranked = rankCandidates(
      fork,
      springs,
      { staticN: 720, riderN: 360 },
      {
        adjuster: { kind: 'spacer', mmPerUnit: 1, position: 10, maxPosition: 30 },
        currentPreloadMm: 10,
        preloadRangeMm: { min: 2, max: 30 },
        windows: windowsAround(36, 3, 18, 4),
      },
      thresholds,
    );
    // k = 10: p = 1080/20 - 36 = 18 mm, static = 720/20 - 18 = 18 mm, exactly on T*.
    const ten = ranked.candidates.find((c) => c.sku === 'F10-b')!;
    expect(ten.preloadMm).toBeCloseTo(18, 12);
    expect(ten.staticSagMm).toBeCloseTo(18, 12);
    // Equal miss: more stock first, and only F10-b has the two springs the fork needs. Then k = 12 (p = 9 mm,
    // static 21 mm: 0.75 half-windows off) before k = 8 (the 30 mm stop gives rider 37.5, static 15 mm: 1.25 off).
    expect(ranked.candidates.map((c) => c.sku)).toEqual(['F10-b', 'F10-a', 'F12', 'F8', 'F40']);
    expect(ranked.candidates.find((c) => c.sku === 'F12')?.missScore).toBeCloseTo(0.75, 12);
    expect(ranked.candidates.find((c) => c.sku === 'F8')?.missScore).toBeCloseTo(1.25, 12);
    expect(ranked.best?.sku).toBe('F10-b');
    expect(ranked.inStock?.sku).toBe('F10-b');
    expect(ranked.candidates.find((c) => c.sku === 'F10-a')?.inStock).toBe(false);
    // k = 40: p = 1080/80 - 36 = -22.5 mm, below the captive minimum; at 2 mm rider sag is 11.5 mm: not a fit.
    const stiff = ranked.candidates[ranked.candidates.length - 1];
    expect(stiff.feasible).toBe(false);
    expect(stiff.fit).toBe('off');
    expect(stiff.setPreloadMm).toBe(2);
    expect(stiff.reason).toBe('At its best setting: Rider sag 11.5 mm (window 33 to 39 mm); static sag 7 mm (window 14 to 22 mm).');
    // Spacer: 18 - 10 = 8 mm longer, in 0.5 mm steps.
    expect(ten.preloadUnits).toBe(8);
  });

  it('flags a spring that every setting leaves topped out without the rider', () => {
    // k = 40 with at least 10 mm of preload: static = 720/80 - p = 9 - p < 0 at every setting, clamped to 0.
    const fork = makeForkModel(roadFront({ springCount: 2, rakeDeg: 0, travelMm: 120 }));
    const ranked = rankCandidates(
      fork,
      [forkSpring('F40', 40)],
      { staticN: 720, riderN: 360 },
      {
        adjuster: { kind: 'spacer', mmPerUnit: 1, position: 10, minPosition: 10, maxPosition: 50 },
        currentPreloadMm: 10,
        preloadRangeMm: { min: 10, max: 50 },
        windows: windowsAround(10, 2, 2, 2),
      },
      thresholds,
    );
    const pick = ranked.candidates[0];
    expect(pick.staticSagMm).toBe(0);
    expect(pick.toppedOut).toBe(true);
    expect(pick.fit).toBe('at-stop');
    expect(pick.feasible).toBe(false);
  });

  it('judges a spring at the most preload that clears coil-bind, and counts those that coil-bind short of their aim', () => {
    const fork = makeForkModel(roadFront({ springCount: 2, rakeDeg: 0, travelMm: 120 }));
    // F10 aims at p = 18 mm, but 140 - 3 mm of margin - 120 mm of travel leaves at most 17 mm: rider 37, static 19,
    // both still inside, so it is a fit at 17 mm with exactly the margin left. F40 (too stiff) is not counted;
    // 100 - 3 - 120 < 2 mm of captive preload, so no setting can be made for it at all.
    const springs = [
      { ...forkSpring('F10', 10), maxDeflectionMm: 140 },
      { ...forkSpring('F40', 40), maxDeflectionMm: 100 },
    ];
    const ranked = rankCandidates(
      fork,
      springs,
      { staticN: 720, riderN: 360 },
      {
        adjuster: { kind: 'spacer', mmPerUnit: 1, position: 10, maxPosition: 30 },
        currentPreloadMm: 10,
        preloadRangeMm: { min: 2, max: 30 },
        windows: windowsAround(36, 3, 18, 4),
      },
      thresholds,
    );
    const ten = ranked.candidates.find((c) => c.sku === 'F10')!;
    expect(ten.feasible).toBe(true);
    expect(ten.setPreloadMm).toBe(17);
    expect(ten.coilBindMarginMm).toBeCloseTo(3, 12);
    const forty = ranked.candidates.find((c) => c.sku === 'F40')!;
    expect(forty.fit).toBeNull();
    expect(forty.reason).toMatch(/^No setting can be made for it/);
    expect(ranked.coilBound).toBe(1);
  });

  it('refuses a spring that coil-binds short of any setting inside the windows', () => {
    const fork = makeForkModel(roadFront({ springCount: 2, rakeDeg: 0, travelMm: 120 }));
    // 130 - 3 - 120 = 7 mm at most: rider sag at least 54 - 7 = 47 mm, past the 39 mm window.
    const tight = { ...forkSpring('F10', 10), maxDeflectionMm: 130 };
    const ranked = rankCandidates(
      fork,
      [tight],
      { staticN: 720, riderN: 360 },
      {
        adjuster: { kind: 'spacer', mmPerUnit: 1, position: 10, maxPosition: 30 },
        currentPreloadMm: 10,
        preloadRangeMm: { min: 2, max: 30 },
        windows: windowsAround(36, 3, 18, 4),
      },
      thresholds,
    );
    expect(ranked.candidates[0].setPreloadMm).toBe(7);
    expect(ranked.candidates[0].coilBindMarginMm).toBeCloseTo(3, 12);
    expect(ranked.candidates[0].feasible).toBe(false);
    expect(ranked.coilBound).toBe(1);
    expect(ranked.best).toBeNull();
  });
});

describe('ride frequency and damping (sections 5g, 5h)', () => {
  it('f = sqrt(k_w/m)/(2*pi) with k_w in N/m', () => {
    // Rear 100 N/mm at LR 2.5: k_w = 16 N/mm = 16000 N/m; m = 912 N / g = 92.9981 kg.
    // sqrt(16000 / 92.9981) = 13.11657 rad/s, / 2 pi = 2.08758 Hz.
    expect(computeRideFrequencyHz(16, 912 / g)).toBeCloseTo(2.08758, 5);
    expect(computeRideFrequencyHz(0, 90)).toBeNull();
  });

  it('a spring change scales zeta by sqrt(k_old/k_new)', () => {
    expect(computeDampingRatioScale(95, 100)).toBeCloseTo(0.974679, 6); // sqrt(0.95)
    expect(computeDampingRatioScale(100, 95)).toBeCloseTo(1.025978, 6); // sqrt(100/95)
  });
});
