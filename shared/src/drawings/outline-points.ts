import type { OutlineInput } from '../engine/schemas/takeoff-input';
import type { PointFt } from './types';

/** Sides of the polygon an oval is drawn with: smooth at phone and print sizes. */
export const OVAL_DRAWING_SEGMENTS = 72;

/**
 * A basin outline as polygon points, ft. A rectangle runs from (0, 0) to (length, width); an oval is
 * the ellipse inscribed in that rectangle, drawn as `segments` points; a freeform outline is returned
 * as given. Not rounded.
 */
export function outlinePoints(
  outline: OutlineInput,
  segments: number = OVAL_DRAWING_SEGMENTS,
): PointFt[] {
  if (outline.shape === 'freeform') return outline.pointsFt.map((p) => ({ ...p }));
  const { lengthFt, widthFt } = outline;
  if (outline.shape === 'rectangle') {
    return [
      { xFt: 0, yFt: 0 },
      { xFt: lengthFt, yFt: 0 },
      { xFt: lengthFt, yFt: widthFt },
      { xFt: 0, yFt: widthFt },
    ];
  }
  const a = lengthFt / 2;
  const b = widthFt / 2;
  return Array.from({ length: segments }, (_, i) => {
    const angle = (2 * Math.PI * i) / segments;
    return { xFt: a + a * Math.cos(angle), yFt: b + b * Math.sin(angle) };
  });
}
