import {
  FITTING_KINDS,
  type EngineParameters,
  type FittingKind,
} from '../parameters/parameters-schema';

export type FittingCounts = Record<FittingKind, number>;

export type FittingsLength = {
  /** Equivalent length of all fittings in pipe of the actual C, ft. */
  equivalentLengthFt: number;
  /** Table value used per fitting (ft, for C = table C) and the size it was read at. */
  perFitting: Record<FittingKind, { tableFt: number; readAtSizeIn: number } | null>;
  multiplier: number;
};

/**
 * Sum of fitting equivalent lengths for one pipe size: Σ count × table length × (C/C_table)^1.852.
 * When the table has no value for a fitting at this size, the next larger size that has one is used
 * (never smaller, so the loss is not understated). ft; not rounded.
 * Source: NFPA 13 equivalent pipe length chart (REFERENCES 5.9).
 */
export function fittingsEquivalentLength(
  counts: FittingCounts,
  nominalSizeIn: number,
  multiplier: number,
  table: EngineParameters['hydraulics']['fittingEquivalentLengthsFt'],
): FittingsLength {
  const rows = [...table].sort((a, b) => a.nominalSizeIn - b.nominalSizeIn);
  const perFitting = {} as FittingsLength['perFitting'];
  let total = 0;
  for (const kind of FITTING_KINDS) {
    const row = rows.find((r) => r.nominalSizeIn >= nominalSizeIn - 1e-9 && r[kind] !== null);
    const fallback = [...rows].reverse().find((r) => r[kind] !== null);
    const use = row ?? fallback;
    const tableFt = use?.[kind] ?? 0;
    perFitting[kind] = use ? { tableFt, readAtSizeIn: use.nominalSizeIn } : null;
    total += counts[kind] * tableFt * multiplier;
  }
  return { equivalentLengthFt: total, perFitting, multiplier };
}
