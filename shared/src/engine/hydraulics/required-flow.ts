import type { SheetStyle } from '../parameters/parameters-schema';

/**
 * Flow the pump must deliver at the operating head, gph: the larger of the turnover flow (pond volume
 * × turnovers per hour) and the waterfall flow (Σ weir width in × gph per inch for its sheet; falls
 * fed side by side add up). Not rounded. Both rules are common practice (REFERENCES 4.1, 4.2).
 */
export function requiredFlow(args: {
  pondGallons: number;
  turnoversPerHour: number;
  waterfalls: ReadonlyArray<{ weirWidthIn: number; sheet: SheetStyle }>;
  weirGphPerInch: Record<SheetStyle, number>;
}): { turnoverGph: number; weirGph: number; requiredGph: number } {
  const turnoverGph = args.pondGallons * args.turnoversPerHour;
  const weirGph = args.waterfalls.reduce(
    (sum, w) => sum + w.weirWidthIn * args.weirGphPerInch[w.sheet],
    0,
  );
  return { turnoverGph, weirGph, requiredGph: Math.max(turnoverGph, weirGph) };
}
