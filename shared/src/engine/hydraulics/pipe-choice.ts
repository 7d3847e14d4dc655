import type { EngineParameters } from '../parameters/parameters-schema';
import { velocityFtPerS } from './hazen-williams';

export type PipeSpec = EngineParameters['hydraulics']['pipes'][number];

/**
 * The pipe for a line: the given nominal size, or with "auto" the smallest size of the material whose
 * velocity at `flowGpm` stays within `maxVelocityFtPerS` (the largest size when none does). Returns
 * null when the material or size is not in the catalogue.
 */
export function choosePipe(
  material: string,
  size: number | 'auto',
  flowGpm: number,
  maxVelocityFtPerS: number,
  pipes: readonly PipeSpec[],
): PipeSpec | null {
  const ofMaterial = pipes
    .filter((p) => p.material === material)
    .sort((a, b) => a.nominalSizeIn - b.nominalSizeIn);
  if (ofMaterial.length === 0) return null;
  if (size !== 'auto')
    return ofMaterial.find((p) => Math.abs(p.nominalSizeIn - size) < 1e-9) ?? null;
  return (
    ofMaterial.find((p) => velocityFtPerS(flowGpm, p.insideDiameterIn) <= maxVelocityFtPerS) ??
    ofMaterial[ofMaterial.length - 1]!
  );
}
