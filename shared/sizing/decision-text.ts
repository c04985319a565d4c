/**
 * The decision in words. Every sentence is built from the decision's own numbers through a
 * formatter, so a screen writes it in the reader's units and the API in SI, from the same code.
 */

import type {
  Certainty,
  DampingHint,
  DecisionReason,
  DecisionStep,
  DecisionText,
  EndDecision,
  LoadCaseResult,
  RangeMm,
  RemeasureItem,
  SettingStep,
  SpringName,
} from '../types/sizing';
import { describeChange, describePosition } from './adjuster';
import { formatNumber } from './format';

/** Quantities in the reader's units. */
export interface QuantityFormat {
  /** "36.6 mm", "1.44 in". */
  length(mm: number): string;
  /** "8.5 N/mm". */
  rate(nmm: number): string;
  /** The figure alone, for "6.5/9 N/mm". */
  rateFigure(nmm: number): string;
  rateUnit: string;
  /** "75 kg". */
  mass(kg: number): string;
}

export const SI_FORMAT: QuantityFormat = {
  length: (mm) => `${formatNumber(mm, 1)} mm`,
  rate: (nmm) => `${formatNumber(nmm, 1)} N/mm`,
  rateFigure: (nmm) => formatNumber(nmm, 1),
  rateUnit: 'N/mm',
  mass: (kg) => `${formatNumber(kg, 1)} kg`,
};

type Decision = Omit<EndDecision, 'text'>;

const PART = { front: 'fork', rear: 'shock' } as const;

export function describeDecision(decision: Decision, format: QuantityFormat): DecisionText {
  const words = new Words(format);
  return {
    headline: words.headline(decision),
    steps: decision.steps.map((step) => words.step(step)),
    reasons: decision.reasons.map((reason) => words.reason(reason)),
    certainty: words.certainty(decision.certainty, decision),
    damping: decision.dampingHint ? words.damping(decision.dampingHint) : null,
  };
}

/** A load case as the rider sets it: "With luggage (15 kg): add 2 turns from the solo setting ...". */
export function describeLoadCase(loadCase: LoadCaseResult, format: QuantityFormat): string {
  return `${loadCase.name} (${format.mass(loadCase.massKg)}): ${describeLoadCaseSetting(loadCase, format)}`;
}

/** The setting alone: the change from the solo setting, or why the spring cannot carry the load. */
export function describeLoadCaseSetting(loadCase: LoadCaseResult, format: QuantityFormat): string {
  const to = describePosition(loadCase.unit, loadCase.position);
  const sag = loadCase.riderSagMm === null ? 'past the full travel' : format.length(loadCase.riderSagMm);
  if (!loadCase.carries) {
    const stop = loadCase.limit === 'coil-bind' ? 'as far as coil-bind allows' : loadCase.limit === 'range' ? "the adjuster's last setting" : 'its best setting';
    return `the ${nameSpring(loadCase.spring, format)} spring cannot carry it. At ${to}, ${stop}, rider sag is ${sag}, past its window: leave the load behind or fit a stiffer spring.`;
  }
  if (Math.abs(loadCase.changeUnits) < 1e-9) return `leave the preload at the solo setting; rider sag ${sag}.`;
  return `${describeChange(loadCase.unit, loadCase.changeUnits)} from the solo setting (to ${to}); rider sag ${sag}. Go back to the solo setting without it.`;
}

/** Names a spring by its label: a dual-rate one as "6.5/9 N/mm dual-rate", never by its rate at sag. */
export function nameSpring(spring: SpringName, format: QuantityFormat): string {
  if (spring.secondRateNmm === null || spring.secondRateNmm === spring.rateNmm) return format.rate(spring.rateNmm);
  return `${format.rateFigure(spring.rateNmm)}/${format.rateFigure(spring.secondRateNmm)} ${format.rateUnit} dual-rate`;
}

class Words {
  constructor(private readonly f: QuantityFormat) {}

  headline(d: Decision): string {
    const preload = d.steps.find((s) => s.kind === 'preload');
    switch (d.kind) {
      case 'keep': {
        const spring = this.installedOf(d);
        return preload
          ? `Keep the ${spring} spring and ${this.adjust(preload.setting)}.`
          : `Keep the ${spring} spring and leave the preload as it is.`;
      }
      case 'marginal':
        return this.marginalHeadline(d, preload?.kind === 'preload' ? preload.setting : null);
      case 'change':
        return this.changeHeadline(d);
      case 'check': {
        const mismatch = d.reasons.find((r) => r.code === 'rate-mismatch' || r.code === 'load-mismatch');
        const remeasure = d.steps.find((s) => s.kind === 'remeasure');
        const part = remeasure?.kind === 'remeasure' ? PART[remeasure.end] : 'end';
        let disagree = 'the readings and the stated spring disagree';
        if (mismatch?.code === 'rate-mismatch') {
          disagree = `the readings imply a ${this.f.rate(mismatch.impliedRateNmm)} spring, but ${this.f.rate(mismatch.statedRateNmm)} is stated`;
        } else if (mismatch?.code === 'load-mismatch') {
          disagree = `with the ${nameSpring(d.installed, this.f)} spring as stated, the rider reading puts ${formatNumber(mismatch.readingN, 0)} N on the ${part}, against ${formatNumber(mismatch.weighedN, 0)} N from the weights`;
        }
        return `Check before acting: ${disagree}. Re-measure the ${part} before changing anything.`;
      }
      default:
        return 'No advice for this end: its targets cannot be aimed at. Check the target profile.';
    }
  }

  private installedOf(d: Decision): string {
    return nameSpring(d.installed, this.f);
  }

  private marginalHeadline(d: Decision, setting: SettingStep | null): string {
    const first = setting ? capitalise(this.adjust(setting)) : 'Leave the preload as it is';
    const spring = this.installedOf(d);
    const side = marginalSide(d);
    const works = `Your ${spring} spring works${side ? `, on the ${side} side` : ''}`;
    const consider = d.steps.find((s) => s.kind === 'consider-spring');
    if (consider?.kind === 'consider-spring') {
      const { better, inStock, orderRateNmm } = consider;
      if (better && inStock && better.sku !== inStock.sku) {
        return `${first}. ${works}: a ${nameSpring(better, this.f)} spring (${nameSpring(inStock, this.f)} in stock) would suit better.`;
      }
      if (better) return `${first}. ${works}: a ${nameSpring(better, this.f)} spring (${better.inStock ? 'in stock' : 'to order'}) would suit better.`;
      if (orderRateNmm !== null) return `${first}. ${works}: a spring of about ${this.f.rate(orderRateNmm)} would suit better.`;
    }
    const edge = d.reasons.find((r) => r.code === 'near-window-edge');
    if (edge?.code === 'near-window-edge') {
      return `${first}. ${works}, but ${edge.which} sag lands within the readings' band of its window's edge: measure again after the change.`;
    }
    return `${first}. ${works}, but only just: measure again after the change.`;
  }

  private changeHeadline(d: Decision): string {
    const why = this.changeCause(d);
    for (const step of d.steps) {
      if (step.kind === 'fit-spring') {
        const s = step.spring;
        return s.inStock
          ? `Fit the ${nameSpring(s, this.f)} spring (${s.sku}, in stock) at ${this.position(step.setting)}: ${why}.`
          : `Order the ${nameSpring(s, this.f)} spring (${s.sku}) and fit it at ${this.position(step.setting)}: ${why}.`;
      }
      if (step.kind === 'spacer') {
        return `Fit a preload spacer ${this.f.length(step.lengthMm)} long under the spring and set the adjuster to ${this.position(step.setting)}: ${why}.`;
      }
      if (step.kind === 'order-spring') {
        const rate = step.rateNmm === null ? 'a spring nearer the ideal rate' : `a spring of about ${this.f.rate(step.rateNmm)}`;
        return `Order ${rate}: ${why}, and none in the catalogue fits.`;
      }
    }
    return `Change the spring: ${why}.`;
  }

  private changeCause(d: Decision): string {
    for (const r of d.reasons) {
      if (r.code === 'too-soft' || r.code === 'too-stiff') return `the ${nameSpring(r.installed, this.f)} spring is ${r.code.replace('-', ' ')}`;
      if (r.code === 'adjuster-limit') {
        const named = `the ${this.installedOf(d)} spring`;
        if (r.cause === 'steps') return `${named} suits, but no step of the adjuster puts both sags in their windows`;
        if (r.cause === 'coil-bind') return `${named} suits, but the preload it needs would take it to coil-bind`;
        return `${named} suits, but it needs ${this.f.length(r.neededMm)} of preload, outside the adjuster's ${this.range(r.rangeMm)}`;
      }
    }
    return 'the fitted spring cannot be set inside both windows';
  }

  step(step: DecisionStep): string {
    switch (step.kind) {
      case 'preload': {
        const what = `${this.adjust(step.setting)}: ${this.sags(step.setting)}`;
        return step.interim ? `For now, ${what}.` : `${capitalise(what)}.`;
      }
      case 'fit-spring': {
        const s = step.spring;
        const stock = s.inStock ? `${s.available} in stock` : 'to order';
        return `Fit the ${nameSpring(s, this.f)} spring (${s.sku}, ${stock}) and set the adjuster to ${this.position(step.setting)}: ${this.sags(step.setting)}.`;
      }
      case 'order-spring': {
        const rate = step.rateNmm === null ? 'nearer the ideal rate' : `of about ${this.f.rate(step.rateNmm)}`;
        return `Order a spring ${rate} in the ${step.family} fit: none in the catalogue keeps both sags in their windows.`;
      }
      case 'spacer':
        return `Fit a preload spacer ${this.f.length(step.lengthMm)} long under the spring, then set the adjuster to ${this.position(step.setting)}: ${this.sags(step.setting)}.`;
      case 'consider-spring': {
        if (step.better) {
          const stock = step.better.inStock ? `${step.better.available} in stock` : 'to order';
          const shelf =
            step.inStock && step.inStock.sku !== step.better.sku ? `, or the ${nameSpring(step.inStock, this.f)} spring on the shelf (${step.inStock.sku})` : '';
          return `If you change the spring: the ${nameSpring(step.better, this.f)} spring (${step.better.sku}, ${stock})${shelf}.`;
        }
        return `If you change the spring: order one of about ${this.f.rate(step.orderRateNmm ?? 0)}; none in the catalogue is nearer.`;
      }
      case 'remeasure':
        return `Re-measure the ${PART[step.end]}: ${step.items.map((item) => REMEASURE[item][step.end]).join('; ')}.`;
      case 'measure-static':
        return step.staticSagMaxMm === null
          ? 'After the change, measure the static sag again.'
          : `After the change, measure the static sag again: it should be ${this.f.length(step.staticSagMaxMm)} at most.`;
    }
  }

  reason(r: DecisionReason): string {
    switch (r.code) {
      case 'inside-windows':
        return `At this setting rider sag is ${this.f.length(r.riderSagMm)} (window ${this.range(r.rider)}) and static sag ${this.f.length(r.staticSagMm)} (window ${this.range(r.static)}).`;
      case 'band-crosses-limit': {
        const limit = r.limitMm === null ? 'a verdict limit' : `the ${r.side === 'soft' ? 'too-soft' : 'too-stiff'} limit of ${this.f.length(r.limitMm)}`;
        return `Rider sag minus static sag is ${this.f.length(r.differenceMm)} ± ${this.f.length(r.bandMm)} from the readings' friction band, which crosses ${limit}.`;
      }
      case 'rate-off-ideal':
        return `The fitted rate, ${this.f.rate(r.effectiveRateNmm)}, is ${formatNumber(Math.abs(r.offPct), 0)} % ${r.offPct < 0 ? 'under' : 'over'} the ideal ${this.f.rate(r.idealRateNmm)}.`;
      case 'near-window-edge':
        return `${capitalise(r.which)} sag ${this.f.length(r.sagMm)} ± ${this.f.length(r.bandMm)} reaches past its window (${this.range(r.window)}).`;
      case 'too-soft':
      case 'too-stiff': {
        const ideal = r.idealRateNmm === null ? '' : `; about ${this.f.rate(r.idealRateNmm)} would`;
        const hint = r.code === 'too-soft' ? 'enough preload for rider sag leaves too little static sag' : 'rider sag stays short of its window at the preload static sag allows';
        return `No preload puts both sags in their windows with the ${nameSpring(r.installed, this.f)} spring: ${hint}${ideal}.`;
      }
      case 'adjuster-limit':
        return r.cause === 'steps'
          ? `The rate suits, but one step of the adjuster moves the sags further than the windows allow.`
          : r.cause === 'coil-bind'
            ? `The rate suits, but ${this.f.length(r.neededMm)} of preload would leave too little before coil-bind.`
            : `The rate suits, but it needs ${this.f.length(r.neededMm)} of preload; the adjuster gives ${this.range(r.rangeMm)}.`;
      case 'rate-mismatch': {
        const band = r.bandNmm === null ? '' : ` ± ${this.f.rate(r.bandNmm)}`;
        const pct = formatNumber((Math.abs(r.impliedRateNmm - r.statedRateNmm) / r.statedRateNmm) * 100, 0);
        return `The readings imply a ${this.f.rate(r.impliedRateNmm)}${band} spring against the ${this.f.rate(r.statedRateNmm)} stated: ${pct} % apart. The figures below hold only if the readings and the weights are right.`;
      }
      case 'load-mismatch': {
        const pct = formatNumber((Math.abs(r.readingN - r.weighedN) / r.weighedN) * 100, 0);
        return `The rider reading, on the stated spring and preload, gives ${formatNumber(r.readingN, 0)} N in all against ${formatNumber(r.weighedN, 0)} N from the weights: ${pct} % apart. The figures below hold only if the readings and the weights are right.`;
      }
      case 'static-topped-out':
        return `The static reading shows no sag (topped out), so the change comes from the rider reading alone (${this.f.length(r.riderSagMm)} of rider sag); static sag after it is bounded, not known.`;
      case 'shelf-short': {
        const leaves = `rider sag ${this.sag(r.riderSagMm)} (window ${this.range(r.rider)}) and static sag ${this.sag(r.staticSagMm)} (window ${this.range(r.static)})`;
        return `The nearest on the shelf, the ${nameSpring(r.spring, this.f)} spring (${r.spring.sku}), still leaves ${leaves}.`;
      }
      case 'none-in-catalogue':
        return `No ${r.family} spring in the catalogue keeps both sags in their windows at a setting the adjuster can make.`;
      case 'targets-invalid':
        return "The end's target windows cannot be aimed at: the rider-sag middle is not above the static one.";
    }
  }

  certainty(certainty: Certainty, d: Decision): string {
    switch (certainty) {
      case 'measured':
        return 'From the readings.';
      case 'marginal':
        return 'Marginal: within what the readings and the model can tell, the answer could go either way.';
      case 'estimate':
        return 'From the weights alone: measure the three lengths to confirm it.';
      case 'bounded': {
        const step = d.steps.find((s) => s.kind === 'measure-static');
        const max = step?.kind === 'measure-static' && step.staticSagMaxMm !== null ? ` (${this.f.length(step.staticSagMaxMm)} at most)` : '';
        return `Partly measured: the static reading was topped out, so static sag after the change is a bound${max}, not a figure.`;
      }
      default:
        return 'In doubt: nothing here is to be acted on until the end is measured again.';
    }
  }

  damping(hint: DampingHint): string {
    const spring = `the ${nameSpring(hint.spring, this.f)} spring`;
    const lead = hint.conditional ? `If you fit ${spring}` : `With ${spring}`;
    if (hint.direction === 'same') return `${lead}, the rebound damping can stay as it is.`;
    return hint.direction === 'more'
      ? `${lead}, start with more rebound damping (clicks in): the same damper damps a stiffer spring less.`
      : `${lead}, start with less rebound damping (clicks out): the same damper damps a softer spring more.`;
  }

  private adjust(setting: SettingStep): string {
    if (Math.abs(setting.changeUnits) < 1e-9) return 'leave the preload as it is';
    return `${describeChange(setting.unit, setting.changeUnits)} (to ${describePosition(setting.unit, setting.position)})`;
  }

  private position(setting: SettingStep): string {
    return describePosition(setting.unit, setting.position);
  }

  private sags(setting: SettingStep): string {
    const bound =
      setting.staticSagMaxMm !== null && setting.staticSagMaxMm > 0 ? `${this.f.length(setting.staticSagMaxMm)} at most` : this.sag(setting.staticSagMm);
    return `rider sag ${this.sag(setting.riderSagMm)}, static sag ${bound}`;
  }

  private sag(mm: number | null): string {
    if (mm === null) return 'past the full travel';
    if (mm === 0) return '0 (topped out)';
    return this.f.length(mm);
  }

  private range(range: RangeMm): string {
    return `${this.f.length(range.min)} to ${this.f.length(range.max)}`;
  }
}

/** Which side a marginal keep leans to: the rate against the ideal, else the side the band crosses. */
function marginalSide(d: Decision): 'soft' | 'stiff' | null {
  for (const r of d.reasons) if (r.code === 'rate-off-ideal') return r.offPct < 0 ? 'soft' : 'stiff';
  for (const r of d.reasons) if (r.code === 'band-crosses-limit') return r.side;
  return null;
}

const REMEASURE: Record<RemeasureItem, Record<'front' | 'rear', string>> = {
  friction: {
    front: 'take each loaded reading twice, pushed down and lifted, and let the fork settle slowly',
    rear: 'take each loaded reading twice, pushed down and lifted, and let the shock settle slowly',
  },
  weights: {
    front: "weigh the rider in full gear again and check the rider's rear share",
    rear: "weigh the rider in full gear again and check the rider's rear share",
  },
  geometry: {
    front: 'count the fork legs that hold a spring and check the rake',
    rear: 'check the wheel travel and shock stroke, or the linkage points',
  },
  'spring-label': {
    front: 'read the rate off the fitted springs themselves',
    rear: 'read the rate off the fitted spring itself',
  },
  preload: {
    front: "measure the springs' preload as fitted",
    rear: "measure the spring's preload as fitted",
  },
};

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

