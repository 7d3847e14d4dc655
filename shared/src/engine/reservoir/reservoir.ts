import { cubicFeetToGallons, inchesToFeet } from '../units/units';

/**
 * Water that drains back to the basin when the pump stops: the moving water on each stream (length ×
 * width × running depth) plus, without a check valve, the contents of the pressure pipe
 * (π/4 · d² · length). gal; not rounded. Running depth is common practice, no source.
 */
export function drainBackGallons(args: {
  streams: ReadonlyArray<{ lengthFt: number; widthFt: number }>;
  streamRunningDepthIn: number;
  pressurePipe: { insideDiameterIn: number; lengthFt: number } | null;
  hasCheckValve: boolean;
}): { streamGallons: number; pipeGallons: number; totalGallons: number } {
  const streamCuFt = args.streams.reduce(
    (sum, s) => sum + s.lengthFt * s.widthFt * inchesToFeet(args.streamRunningDepthIn),
    0,
  );
  const pipeCuFt =
    args.pressurePipe && !args.hasCheckValve
      ? (Math.PI / 4) *
        inchesToFeet(args.pressurePipe.insideDiameterIn) ** 2 *
        args.pressurePipe.lengthFt
      : 0;
  const streamGallons = cubicFeetToGallons(streamCuFt);
  const pipeGallons = cubicFeetToGallons(pipeCuFt);
  return { streamGallons, pipeGallons, totalGallons: streamGallons + pipeGallons };
}

/**
 * Water a pond-free waterfall's basin holds: L × W × D × void fraction of its fill, in gal. Not
 * rounded. Gravel voids are derived from densities (REFERENCES 6.2, 6.3); block voids are common
 * practice, no source.
 */
export function reservoirCapacityGallons(
  box: { lengthFt: number; widthFt: number; depthFt: number },
  voidFraction: number,
): number {
  return cubicFeetToGallons(box.lengthFt * box.widthFt * box.depthFt * voidFraction);
}
