/**
 * The seed of the symptom-to-change table: for each symptom at each end it applies to, the
 * adjusters to try in order and which way. All rows are common practice, no source: the usual first
 * moves of a suspension setup, not measurements of any damper. Split (high-/low-speed) adjusters
 * come before the plain one where the symptom lives at one shaft speed; an end without the split
 * adjuster falls through to the plain one. The admin edits these rows and shops add their own; the
 * engine (next-change.ts) reads whatever rows are stored.
 *
 * `claim` names the step-response effect a row relies on, checked in both directions against an
 * ODE solution in test/shared/damping/rule-physics.test.ts; rows whose effect is not a property of
 * the linear spring-damper model (a stroke running out, say) claim nothing.
 */

import type { DampingClaim, DampingDirection, DampingRule, SymptomKey } from '../types/damping';
import type { EndKind } from '../types/sizing';

type SeedRow = [symptom: SymptomKey, end: EndKind, adjuster: string, direction: DampingDirection, priority: number, claim: DampingClaim | null, why: string, feelFor: string];

const BOUNCE_WHY = 'The end keeps moving after the bump because too little rebound damping lets it overshoot; more rebound damping settles it sooner.';
const BOUNCE_FEEL = 'After a single bump the end should settle in one movement, without a second bounce.';
const HARSH_WHY = 'A sharp edge is a fast shaft movement, where compression damping passes force straight to the chassis; less of it lets the wheel move up and out of the way.';
const HARSH_FEEL = 'Small sharp edges should feel rounded off; check the end still holds up on big hits.';
const DIVE_WHY = 'Braking loads the fork slowly compared with a bump; more (low-speed) compression damping slows how fast it goes down.';
const DIVE_FEEL = 'The front should go down more slowly and less far as you brake, without feeling harsh over bumps.';
const WALLOW_WHY = 'The bike moves slowly on its suspension through the bend; more (low-speed) compression damping resists that slow movement.';
const WALLOW_FEEL = 'The bike should feel settled and hold its line through long bends.';
const PACK_WHY = 'The end is still extending when the next bump arrives; less rebound damping lets it come back up sooner between bumps.';
const PACK_FEEL = 'The end should keep its height over a run of bumps; watch that it does not start to bounce after single ones.';
const BOTTOM_WHY = 'A big hit drives the end through its travel fast; more (high-speed) compression damping takes up more of the hit before the travel runs out.';
const BOTTOM_FEEL = 'Big hits should end without a clunk; small sharp bumps should not turn harsh.';
const KICK_WHY = 'The end springs back faster than the wheel can follow the road; more rebound damping slows its return.';
const KICK_FEEL = 'Out of dips the end should come back up smoothly, without a kick.';
const SQUAT_WHY = 'Weight moves back as you open the throttle; more (low-speed) compression damping slows how fast the rear sits down.';
const SQUAT_FEEL = 'The rear should stay higher as you open the throttle.';
const WIDE_WHY = 'As the rear sits down under power the front rises and the bike steers wider; more (low-speed) compression damping slows the rear going down.';
const WIDE_FEEL = 'Out of corners the bike should hold its line as you open the throttle.';
const CHATTER_COMPRESSION_WHY =
  'Ripples leaned over are quick, small inputs: compression damping is tried first because too much of it makes the tyre skip over them instead of following them.';
const CHATTER_REBOUND_WHY = 'Too much rebound damping can keep the wheel from coming back down to the road between ripples; less lets it return sooner.';
const CHATTER_FEEL = 'Leaned over on rippled tarmac the tyre should track without judder.';

const ROWS: readonly SeedRow[] = [
  ['dives-braking', 'front', 'ls-compression', 'more', 1, 'slower-dive', DIVE_WHY, DIVE_FEEL],
  ['dives-braking', 'front', 'compression', 'more', 2, 'slower-dive', DIVE_WHY, DIVE_FEEL],

  ['bounces-after-bump', 'front', 'rebound', 'more', 1, 'less-overshoot', BOUNCE_WHY, BOUNCE_FEEL],
  ['bounces-after-bump', 'front', 'ls-rebound', 'more', 2, 'less-overshoot', BOUNCE_WHY, BOUNCE_FEEL],
  ['bounces-after-bump', 'rear', 'rebound', 'more', 1, 'less-overshoot', BOUNCE_WHY, BOUNCE_FEEL],
  ['bounces-after-bump', 'rear', 'ls-rebound', 'more', 2, 'less-overshoot', BOUNCE_WHY, BOUNCE_FEEL],

  ['harsh-small-bumps', 'front', 'hs-compression', 'less', 1, 'softer-on-sharp-bumps', HARSH_WHY, HARSH_FEEL],
  ['harsh-small-bumps', 'front', 'compression', 'less', 2, 'softer-on-sharp-bumps', HARSH_WHY, HARSH_FEEL],
  ['harsh-small-bumps', 'rear', 'hs-compression', 'less', 1, 'softer-on-sharp-bumps', HARSH_WHY, HARSH_FEEL],
  ['harsh-small-bumps', 'rear', 'compression', 'less', 2, 'softer-on-sharp-bumps', HARSH_WHY, HARSH_FEEL],

  ['wallows-long-corners', 'front', 'ls-compression', 'more', 1, 'slower-dive', WALLOW_WHY, WALLOW_FEEL],
  ['wallows-long-corners', 'front', 'compression', 'more', 2, 'slower-dive', WALLOW_WHY, WALLOW_FEEL],
  ['wallows-long-corners', 'rear', 'ls-compression', 'more', 1, 'slower-dive', WALLOW_WHY, WALLOW_FEEL],
  ['wallows-long-corners', 'rear', 'compression', 'more', 2, 'slower-dive', WALLOW_WHY, WALLOW_FEEL],

  ['sinks-repeated-bumps', 'front', 'rebound', 'less', 1, 'faster-recovery', PACK_WHY, PACK_FEEL],
  ['sinks-repeated-bumps', 'front', 'ls-rebound', 'less', 2, 'faster-recovery', PACK_WHY, PACK_FEEL],
  ['sinks-repeated-bumps', 'rear', 'rebound', 'less', 1, 'faster-recovery', PACK_WHY, PACK_FEEL],
  ['sinks-repeated-bumps', 'rear', 'ls-rebound', 'less', 2, 'faster-recovery', PACK_WHY, PACK_FEEL],

  ['bottoms-big-hits', 'front', 'hs-compression', 'more', 1, null, BOTTOM_WHY, BOTTOM_FEEL],
  ['bottoms-big-hits', 'front', 'compression', 'more', 2, null, BOTTOM_WHY, BOTTOM_FEEL],
  ['bottoms-big-hits', 'rear', 'hs-compression', 'more', 1, null, BOTTOM_WHY, BOTTOM_FEEL],
  ['bottoms-big-hits', 'rear', 'compression', 'more', 2, null, BOTTOM_WHY, BOTTOM_FEEL],

  ['kicks-after-dip', 'front', 'rebound', 'more', 1, 'less-overshoot', KICK_WHY, KICK_FEEL],
  ['kicks-after-dip', 'front', 'ls-rebound', 'more', 2, 'less-overshoot', KICK_WHY, KICK_FEEL],
  ['kicks-after-dip', 'rear', 'rebound', 'more', 1, 'less-overshoot', KICK_WHY, KICK_FEEL],
  ['kicks-after-dip', 'rear', 'ls-rebound', 'more', 2, 'less-overshoot', KICK_WHY, KICK_FEEL],

  ['runs-wide-throttle', 'rear', 'ls-compression', 'more', 1, 'slower-dive', WIDE_WHY, WIDE_FEEL],
  ['runs-wide-throttle', 'rear', 'compression', 'more', 2, 'slower-dive', WIDE_WHY, WIDE_FEEL],

  ['squats-throttle', 'rear', 'ls-compression', 'more', 1, 'slower-dive', SQUAT_WHY, SQUAT_FEEL],
  ['squats-throttle', 'rear', 'compression', 'more', 2, 'slower-dive', SQUAT_WHY, SQUAT_FEEL],

  ['chatters-corners', 'front', 'hs-compression', 'less', 1, 'softer-on-sharp-bumps', CHATTER_COMPRESSION_WHY, CHATTER_FEEL],
  ['chatters-corners', 'front', 'compression', 'less', 2, 'softer-on-sharp-bumps', CHATTER_COMPRESSION_WHY, CHATTER_FEEL],
  ['chatters-corners', 'front', 'rebound', 'less', 3, 'faster-recovery', CHATTER_REBOUND_WHY, CHATTER_FEEL],
  ['chatters-corners', 'front', 'ls-rebound', 'less', 4, 'faster-recovery', CHATTER_REBOUND_WHY, CHATTER_FEEL],
  ['chatters-corners', 'rear', 'hs-compression', 'less', 1, 'softer-on-sharp-bumps', CHATTER_COMPRESSION_WHY, CHATTER_FEEL],
  ['chatters-corners', 'rear', 'compression', 'less', 2, 'softer-on-sharp-bumps', CHATTER_COMPRESSION_WHY, CHATTER_FEEL],
  ['chatters-corners', 'rear', 'rebound', 'less', 3, 'faster-recovery', CHATTER_REBOUND_WHY, CHATTER_FEEL],
  ['chatters-corners', 'rear', 'ls-rebound', 'less', 4, 'faster-recovery', CHATTER_REBOUND_WHY, CHATTER_FEEL],
];

export const SEEDED_DAMPING_RULES: readonly Omit<DampingRule, 'id'>[] = ROWS.map(([symptom, end, adjuster, direction, priority, claim, why, feelFor]) => ({
  symptom,
  end,
  adjuster,
  direction,
  priority,
  why,
  feelFor,
  claim,
  source: 'common-practice',
  active: true,
}));
