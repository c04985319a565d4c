/**
 * The invented bike models of the demo workshop's catalogue, fitted with springs of the demo
 * catalogue's families (server/seed/demo-catalogue.ts): one roadster, one tourer, one trail bike
 * with a linkage curve, one sport bike. Every figure is invented for the demo, the damping
 * adjusters' counts and makers' standards among them; none has a dyno sheet.
 */
import { EntityManager } from 'typeorm';
import type { DamperAdjuster, DamperUnit } from '../../shared/types/damping';
import { BikeModel } from '../entities/bike-model.entity';
import type { BikeModelInput } from '../services/bike-models.service';

/** An adjuster set at its maker's standard. */
function damper(kind: string, unit: DamperUnit, maxPosition: number, standard: number): DamperAdjuster {
  return { kind, unit, maxPosition, standard, position: standard, dampingPerStepNsPerM: null };
}

export const DEMO_BIKE_MODELS: readonly BikeModelInput[] = [
  {
    name: 'Tarn 690 Roadster',
    description: 'Twin-cylinder roadster: conventional fork with a preload spacer, shock with a stepped cam.',
    masses: { massKg: 196, frontShare: 0.5, unsprungFrontKg: 17, unsprungRearKg: 21 },
    front: {
      travelMm: 130,
      springCount: 2,
      rakeDeg: 25,
      rateNmm: 9,
      secondRateNmm: null,
      breakMm: null,
      preloadMm: 15,
      family: 'F37x320',
      adjuster: { kind: 'spacer', mmPerUnit: 1, position: 0, minPosition: -10, maxPosition: 20, zeroReference: 'the 90 mm stock spacer', addsPreload: 'longer spacer' },
      // A budget fork: damping fixed by its oil and valving.
      dampers: [],
    },
    rear: {
      wheelTravelMm: 135,
      shockStrokeMm: 48,
      gasForceN: 200,
      linkage: null,
      rateNmm: 95,
      secondRateNmm: null,
      breakMm: null,
      preloadMm: 8,
      family: 'S56x150',
      adjuster: { kind: 'stepped', mmPerUnit: 2.5, position: 2, minPosition: 0, maxPosition: 6, zeroReference: 'the softest step', addsPreload: 'clockwise' },
      // A slotted rebound screw without detents, counted in turns.
      dampers: [damper('rebound', 'turns', 3, 1.5)],
    },
  },
  {
    name: 'Harrow 900 Tourer',
    description: 'Touring triple: fork with preload caps, shock with a remote preload knob, rebound and compression adjusters.',
    masses: { massKg: 248, frontShare: 0.48, unsprungFrontKg: 20, unsprungRearKg: 26 },
    front: {
      travelMm: 130,
      springCount: 2,
      rakeDeg: 27,
      rateNmm: 10,
      secondRateNmm: null,
      breakMm: null,
      preloadMm: 12,
      family: 'F43x290',
      adjuster: { kind: 'threaded', mmPerUnit: 1, position: 6, minPosition: 0, maxPosition: 15, zeroReference: 'caps screwed fully out', addsPreload: 'clockwise' },
      dampers: [damper('rebound', 'clicks', 16, 8)],
    },
    rear: {
      wheelTravelMm: 140,
      shockStrokeMm: 60,
      gasForceN: 250,
      linkage: null,
      rateNmm: 120,
      secondRateNmm: null,
      breakMm: null,
      preloadMm: 10,
      family: 'S61x170',
      adjuster: { kind: 'threaded', mmPerUnit: 0.5, position: 10, minPosition: 0, maxPosition: 30, zeroReference: 'knob turned fully counter-clockwise', addsPreload: 'clockwise' },
      dampers: [damper('rebound', 'clicks', 24, 12), damper('compression', 'clicks', 20, 10)],
    },
  },
  {
    name: 'Brisk 450 Trail',
    description: 'Single-cylinder trail bike: long-travel fork, progressive linkage at the rear.',
    masses: { massKg: 152, frontShare: 0.47, unsprungFrontKg: 13, unsprungRearKg: 18 },
    front: {
      travelMm: 180,
      springCount: 2,
      rakeDeg: 27.5,
      rateNmm: 6.5,
      secondRateNmm: null,
      breakMm: null,
      preloadMm: 5,
      family: 'F37x320',
      adjuster: { kind: 'threaded', mmPerUnit: 1, position: 2, minPosition: 0, maxPosition: 8, zeroReference: 'caps screwed fully out', addsPreload: 'clockwise' },
      dampers: [damper('rebound', 'clicks', 20, 12), damper('compression', 'clicks', 20, 12)],
    },
    rear: {
      wheelTravelMm: 200,
      shockStrokeMm: 65,
      gasForceN: 200,
      // Shock compression rises faster than wheel travel near the end: a progressive linkage.
      linkage: [
        [0, 0],
        [50, 14],
        [100, 29.5],
        [150, 46.5],
        [200, 65],
      ],
      rateNmm: 105,
      secondRateNmm: null,
      breakMm: null,
      preloadMm: 8,
      family: 'S61x170',
      adjuster: {
        kind: 'threaded',
        mmPerUnit: 1.5,
        position: 5,
        minPosition: 0,
        maxPosition: 12,
        zeroReference: 'collar at the top of the thread',
        addsPreload: 'counter-clockwise',
      },
      // Off-road style: high-speed compression on a knob counted in turns, low-speed on a clicker screw.
      dampers: [damper('rebound', 'clicks', 24, 14), damper('hs-compression', 'turns', 2.5, 1.25), damper('ls-compression', 'clicks', 20, 12)],
    },
  },
  {
    name: 'Vell 1000 Sport',
    description: 'Four-cylinder sport bike: fully adjustable fork and shock, compression split into high and low speed.',
    masses: { massKg: 201, frontShare: 0.53, unsprungFrontKg: 16, unsprungRearKg: 20 },
    front: {
      travelMm: 120,
      springCount: 2,
      rakeDeg: 23.5,
      rateNmm: 10.5,
      secondRateNmm: null,
      breakMm: null,
      preloadMm: 10,
      family: 'F43x290',
      adjuster: { kind: 'threaded', mmPerUnit: 1, position: 8, minPosition: 0, maxPosition: 15, zeroReference: 'caps screwed fully out', addsPreload: 'clockwise' },
      dampers: [damper('rebound', 'clicks', 20, 10), damper('hs-compression', 'clicks', 12, 6), damper('ls-compression', 'clicks', 20, 9)],
    },
    rear: {
      wheelTravelMm: 130,
      shockStrokeMm: 55,
      gasForceN: 250,
      linkage: null,
      rateNmm: 95,
      secondRateNmm: null,
      breakMm: null,
      preloadMm: 8,
      family: 'S56x150',
      adjuster: { kind: 'threaded', mmPerUnit: 1, position: 6, minPosition: 0, maxPosition: 14, zeroReference: 'collar backed off to the lock ring', addsPreload: 'clockwise' },
      dampers: [damper('rebound', 'clicks', 24, 11), damper('hs-compression', 'clicks', 10, 4), damper('ls-compression', 'clicks', 20, 10)],
    },
  },
];

export async function seedDemoBikeModels(manager: EntityManager): Promise<void> {
  const now = new Date();
  await manager.getRepository(BikeModel).insert(DEMO_BIKE_MODELS.map((model) => ({ ...model, createdAt: now, updatedAt: now })));
}
