/** Identifies an unlabelled spring from its wire, diameter and coils, with the nearest catalogue rates. */
import type { IdentifyInput } from '../../shared/schemas/catalogue.schema';
import { identifySpring, SHEAR_MODULUS, USUAL_SPRING_INDEX } from '../../shared/sizing/helical-spring';
import type { IdentifyAnswer } from '../../shared/types/catalogue';
import type { Role } from '../../shared/types/roles';
import { formatNumber } from '../../shared/sizing/format';
import { fromSi } from '../../shared/units';
import { CatalogueService, toSpringView } from './catalogue.service';

export async function identifyCatalogueSpring(catalogue: CatalogueService, input: IdentifyInput, role: Role): Promise<IdentifyAnswer> {
  const found = identifySpring({
    wireDiameterMm: input.wireDiameterMm,
    outerDiameterMm: input.outerDiameterMm,
    activeCoils: input.activeCoils ?? undefined,
    totalCoils: input.totalCoils ?? undefined,
    material: input.material,
  });
  const modulus = SHEAR_MODULUS[input.material];
  const notes = [
    'A 1 % error in the wire diameter is about 4 % in the rate: measure it with a micrometer in more than one place.',
    'The formula holds for a spring of even pitch; a progressive (variable-pitch) spring has no single rate.',
  ];
  if (modulus.rangeMpa[0] !== modulus.rangeMpa[1]) {
    notes.push(
      `${modulus.label} varies from alloy to alloy (G ${formatNumber(modulus.rangeMpa[0] / 1000, 0)}-${formatNumber(modulus.rangeMpa[1] / 1000, 0)} GPa): the rate lies in the range given.`,
    );
  }
  const [low, high] = USUAL_SPRING_INDEX;
  if (found.springIndex < low || found.springIndex > high) {
    notes.push(`The spring index (mean diameter over wire) is ${formatNumber(found.springIndex, 1)}, outside the usual ${low} to ${high}: re-measure both diameters.`);
  }
  const matches = await catalogue.nearestRates(found.rateNmm, { kind: input.kind, family: input.family || undefined, limit: input.limit });
  return {
    material: input.material,
    shearModulusMpa: found.shearModulusMpa,
    meanDiameterMm: found.meanDiameterMm,
    activeCoils: found.activeCoils,
    springIndex: found.springIndex,
    rateNmm: found.rateNmm,
    rateRangeNmm: found.rateRangeNmm,
    rateInUnit: fromSi(found.rateNmm, input.unit),
    rateRangeInUnit: [fromSi(found.rateRangeNmm[0], input.unit), fromSi(found.rateRangeNmm[1], input.unit)],
    unit: input.unit,
    notes,
    matches: matches.map((m) => ({ spring: toSpringView(m.spring, input.unit, role), differenceNmm: m.differenceNmm, differencePct: m.differencePct })),
  };
}
