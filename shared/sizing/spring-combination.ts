/**
 * Springs acting together (section 8; any mechanics text): side by side they share the deflection,
 * so their rates add; end to end they share the force, so their compliances (1/k) add.
 */

function requireRates(ratesNmm: readonly number[]): void {
  if (ratesNmm.length === 0) throw new RangeError('At least one spring rate is needed');
  for (const rate of ratesNmm) {
    if (!(Number.isFinite(rate) && rate > 0)) throw new RangeError(`A spring rate must be a positive number, not ${rate}`);
  }
}

/** Springs in parallel (the two legs of a fork): k = k1 + k2 + ... (N/mm). */
export function computeParallelRate(ratesNmm: readonly number[]): number {
  requireRates(ratesNmm);
  return ratesNmm.reduce((sum, rate) => sum + rate, 0);
}

/** Springs in series (stacked on one shock): 1/k = 1/k1 + 1/k2 + ... (N/mm). */
export function computeSeriesRate(ratesNmm: readonly number[]): number {
  requireRates(ratesNmm);
  return 1 / ratesNmm.reduce((sum, rate) => sum + 1 / rate, 0);
}
