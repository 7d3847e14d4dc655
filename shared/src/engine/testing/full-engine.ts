import { insetPolygon } from '../geometry/polygon-inset';
import { defaultEngineParameters } from '../parameters/defaults';
import type { EngineParameters } from '../parameters/parameters-schema';
import { computeTakeoff } from '../takeoff/compute-takeoff';

/**
 * The engine as the server runs it: with the general polygon offset, so every outline can be measured.
 * For tests and the benchmark; not exported from the package.
 */
export function computeFullTakeoff(
  input: unknown,
  params: EngineParameters = defaultEngineParameters,
) {
  return computeTakeoff(input, params, { insetPolygon });
}
