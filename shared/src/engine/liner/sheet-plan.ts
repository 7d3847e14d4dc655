import { ceilToStep } from '../units/rounding';

export type SheetPlan = {
  /** Panel widths across the roll, ft, widest first; one panel when no seam is needed. */
  panelWidthsFt: number[];
  /** Every panel's ordered length, ft (a multiple of the length step). */
  panelLengthFt: number;
  seamCount: number;
  /** Total length of taped seams, ft. */
  seamLengthFt: number;
  orderedAreaSqFt: number;
  /** Which needed dimension runs across the roll: the needed width or the needed length. */
  acrossIs: 'width' | 'length';
};

function planAcross(
  acrossFt: number,
  alongFt: number,
  widths: readonly number[],
  lengthStepFt: number,
  seamOverlapFt: number,
): Omit<SheetPlan, 'acrossIs'> {
  const panelLengthFt = ceilToStep(alongFt, lengthStepFt);
  const smallestCovering = (needFt: number) => widths.find((w) => w >= needFt - 1e-9);
  const single = smallestCovering(acrossFt);
  if (single !== undefined) {
    return {
      panelWidthsFt: [single],
      panelLengthFt,
      seamCount: 0,
      seamLengthFt: 0,
      orderedAreaSqFt: single * panelLengthFt,
    };
  }
  const widest = widths[widths.length - 1]!;
  const gainPerPanel = widest - seamOverlapFt;
  const panels = Math.ceil((acrossFt - widest) / gainPerPanel - 1e-9) + 1;
  const fullPanels = panels - 1;
  const coveredFt = widest + (fullPanels - 1) * gainPerPanel;
  const last = smallestCovering(acrossFt - coveredFt + seamOverlapFt) ?? widest;
  const panelWidthsFt = [...Array<number>(fullPanels).fill(widest), last];
  const seamCount = panels - 1;
  return {
    panelWidthsFt,
    panelLengthFt,
    seamCount,
    seamLengthFt: seamCount * panelLengthFt,
    orderedAreaSqFt: panelWidthsFt.reduce((sum, w) => sum + w, 0) * panelLengthFt,
  };
}

/**
 * Orders a rectangular liner of `neededLengthFt` × `neededWidthFt`: each dimension is rounded up, one
 * across the roll to an offered sheet width, the other along the roll to the length step. When the
 * across dimension is wider than the widest sheet, panels of the widest sheet (and one narrower last
 * panel) are seamed with `seamOverlapFt` of overlap. Both orientations are tried; the smaller ordered
 * area wins (then fewer seams). Inputs and outputs in ft / ft²; rounding is up, to stock.
 * Source: stock widths and steps are common practice (REFERENCES 3.3).
 */
export function planSheets(
  neededLengthFt: number,
  neededWidthFt: number,
  sheetWidthsFt: readonly number[],
  lengthStepFt: number,
  seamOverlapFt: number,
): SheetPlan {
  const widths = [...sheetWidthsFt].sort((a, b) => a - b);
  const widthAcross = {
    ...planAcross(neededWidthFt, neededLengthFt, widths, lengthStepFt, seamOverlapFt),
    acrossIs: 'width' as const,
  };
  const lengthAcross = {
    ...planAcross(neededLengthFt, neededWidthFt, widths, lengthStepFt, seamOverlapFt),
    acrossIs: 'length' as const,
  };
  const better =
    lengthAcross.orderedAreaSqFt < widthAcross.orderedAreaSqFt - 1e-9 ||
    (Math.abs(lengthAcross.orderedAreaSqFt - widthAcross.orderedAreaSqFt) <= 1e-9 &&
      lengthAcross.seamCount < widthAcross.seamCount);
  const plan = better ? lengthAcross : widthAcross;
  return { ...plan, panelWidthsFt: [...plan.panelWidthsFt].sort((a, b) => b - a) };
}
