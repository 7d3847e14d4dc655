import {
  needsPolygonLibrary,
  type EngineGeometry,
  type OutlineInput,
  type TakeoffInput,
} from '@pondwright/shared/engine';
import { useEffect, useMemo, useState } from 'react';

type PolygonInset = NonNullable<EngineGeometry['insetPolygon']>;

const isPoint = (p: unknown): p is { xFt: number; yFt: number } =>
  typeof p === 'object' &&
  p !== null &&
  Number.isFinite((p as { xFt: unknown }).xFt) &&
  Number.isFinite((p as { yFt: unknown }).yFt);

/** A freeform outline with an inward bend: only the polygon-offset module can measure its shelves. */
export function anyOutlineBendsInward(values: TakeoffInput): boolean {
  return values.basins.some((basin) => {
    const outline = basin?.outline as OutlineInput | undefined;
    if (outline?.shape !== 'freeform') return false;
    if (!Array.isArray(outline.pointsFt) || outline.pointsFt.length < 3) return false;
    return outline.pointsFt.every(isPoint) && needsPolygonLibrary(outline);
  });
}

/**
 * Loads the polygon-offset module (about 26 KB gzipped) the first time an outline needs it, so
 * rectangles, ovals and convex outlines never download it.
 */
export function usePolygonInset(needed: boolean) {
  const [insetPolygon, setInsetPolygon] = useState<PolygonInset | null>(null);
  const [failed, setFailed] = useState(false);
  const load = needed && insetPolygon === null && !failed;

  useEffect(() => {
    if (!load) return;
    let current = true;
    import('@pondwright/shared/engine/polygon-inset')
      .then((module) => {
        if (current) setInsetPolygon(() => module.insetPolygon);
      })
      .catch(() => {
        if (current) setFailed(true);
      });
    return () => {
      current = false;
    };
  }, [load]);

  const geometry = useMemo<EngineGeometry>(
    () => (insetPolygon ? { insetPolygon } : {}),
    [insetPolygon],
  );
  return { geometry, loading: load };
}
