/** The shared decision's sentences in the person's units: the bridge from DisplayUnits to a QuantityFormat. */
import { useMemo } from 'react';

import { useUnits } from '@/hooks/use-units';
import type { QuantityFormat } from '@shared/sizing/decision-text';
import type { DisplayUnits } from '@shared/types/garage';
import { formatNumber } from '@shared/sizing/format';
import { fromSi } from '@shared/units';

import { digitsFor, formatQuantity, unitFor } from './format';

export function toQuantityFormat(units: DisplayUnits): QuantityFormat {
  const rateUnit = unitFor('rate', units);
  return {
    length: (mm) => formatQuantity(mm, 'length', units),
    rate: (nmm) => formatQuantity(nmm, 'rate', units),
    rateFigure: (nmm) => formatNumber(fromSi(nmm, rateUnit), digitsFor(rateUnit)),
    rateUnit,
    mass: (kg) => formatQuantity(kg, 'mass', units),
  };
}

export function useQuantityFormat(): QuantityFormat {
  const { units } = useUnits();
  return useMemo(() => toQuantityFormat(units), [units]);
}
