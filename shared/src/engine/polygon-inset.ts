// The general polygon offset (clipper-lib), kept apart from the engine so a browser loads it only when
// a freeform outline bends inward: `computeTakeoff(input, params, { insetPolygon })`.
export { insetPolygon, type InsetResult } from './geometry/polygon-inset';
