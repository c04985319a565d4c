/** What each loaded step asks of the rider and the helper, in plain words. */
import type { EndKind } from '@shared/types/sizing';

export type Stage = 'extended' | 'static' | 'rider';

export const MARKS: Record<EndKind, string> = {
  rear: 'From the centre of the rear axle straight up to a point on the subframe or the tail above it. Put a piece of tape there and mark it, so every reading uses the same point.',
  front: 'Along the fork leg: from the dust seal on the top of the slider to the axle clamp at the bottom. Measure along the fork, not straight up.',
};

export type StageText = { title: string; rider: string; helper: string; why?: string };

export const STAGE_TEXTS: Record<Stage, Record<EndKind, StageText>> = {
  extended: {
    rear: {
      title: 'Rear fully extended',
      rider: 'Lift the rear until the wheel is just off the ground (a paddock stand or a jack under the frame).',
      helper: 'Measure between the two marks with the spring fully extended. No one pushes on the bike.',
    },
    front: {
      title: 'Front fully extended',
      rider: 'Lift the front until the wheel hangs off the ground (a front stand or a jack under the engine).',
      helper: 'Measure from the dust seal to the axle clamp with the fork fully extended.',
    },
  },
  static: {
    rear: {
      title: 'Rear on its wheels, no rider',
      rider: 'Take the bike off the stand and hold it upright by the bars; nobody sits on it.',
      helper: 'Push the rear down about 25 mm and let it rise slowly: measure. Then lift it about 25 mm and let it settle slowly: measure again.',
      why: 'Seals and bushes hold the suspension a little high or low by friction; the truth is between the two readings.',
    },
    front: {
      title: 'Front on its wheels, no rider',
      rider: 'Hold the bike upright on both wheels; nobody sits on it.',
      helper: 'Push the front down and let it rise slowly: measure. Lift the bars and let it settle slowly: measure again.',
      why: 'Fork seals stick: one reading after pushing and one after lifting bracket the real length.',
    },
  },
  rider: {
    rear: {
      title: 'Rear with you aboard',
      rider: 'Sit on the bike in your gear in riding position, feet on the pegs, a hand on the bars. Someone steadies the bike.',
      helper: 'Push the rear down and let it rise: measure. Then lift it and let it settle: measure again.',
      why: 'Friction again: the two readings bracket the real rider sag.',
    },
    front: {
      title: 'Front with you aboard',
      rider: 'Sit in riding position, feet on the pegs, hands on the bars, weight as when riding.',
      helper: 'Push the front down and let it rise: measure. Lift and let it settle: measure again.',
      why: 'Friction again: the two readings bracket the real rider sag.',
    },
  },
};
