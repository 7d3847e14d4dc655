/**
 * Two-wire voltage drop for one segment: VD = 2 · L · I · R / 1000, with L the one-way length (ft),
 * I the current (A) and R the conductor resistance (Ω per 1000 ft). V; not rounded.
 * Source: standard formula (REFERENCES 7.2); R from NEC Chapter 9 Table 8 (REFERENCES 7.1).
 */
export function twoWireVoltageDrop(oneWayFt: number, amps: number, ohmsPer1000Ft: number): number {
  return (2 * oneWayFt * amps * ohmsPer1000Ft) / 1000;
}

export type LightingRunResult = {
  totalWatts: number;
  /** Current in the first segment (the whole run's load), A. */
  currentAmps: number;
  voltageDropV: number;
  voltageAtLastFixtureV: number;
  dropPercent: number;
};

/**
 * Voltage at the last fixture of a low-voltage run. The fixtures sit evenly along the cable (the k-th
 * of n at k/n of its length, the last at the end); each segment carries the current of every fixture
 * beyond it, each fixture drawing W / V_nominal (constant power at nominal voltage). The drop is the
 * sum over segments of the two-wire formula. V, A, %; not rounded.
 */
export function lightingRun(
  run: { cableLengthFt: number; fixtureWatts: readonly number[] },
  nominalVolts: number,
  ohmsPer1000Ft: number,
): LightingRunResult {
  const n = run.fixtureWatts.length;
  const segmentFt = run.cableLengthFt / n;
  let beyondWatts = run.fixtureWatts.reduce((sum, w) => sum + w, 0);
  const totalWatts = beyondWatts;
  let drop = 0;
  for (let k = 0; k < n; k++) {
    drop += twoWireVoltageDrop(segmentFt, beyondWatts / nominalVolts, ohmsPer1000Ft);
    beyondWatts -= run.fixtureWatts[k]!;
  }
  return {
    totalWatts,
    currentAmps: totalWatts / nominalVolts,
    voltageDropV: drop,
    voltageAtLastFixtureV: nominalVolts - drop,
    dropPercent: (drop / nominalVolts) * 100,
  };
}
