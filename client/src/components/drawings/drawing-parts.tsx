import {
  depthExaggeration,
  projectDrawing,
  spansOf,
  type BoundsFt,
  type DimensionLine,
  type DrawingProjection,
  type PointFt,
} from '@pondwright/shared/drawings';

/** Drawing width in SVG units; text sizes below stay readable when it is shrunk to a 360 px phone. */
export const DRAWING_WIDTH = 320;
export const LABEL_SIZE = 13;
const PAD_X = 40;
const PAD_Y = 12;

export const DRAWING_COLORS = {
  water: 'var(--mantine-color-blue-1)',
  waterLine: 'var(--mantine-color-blue-6)',
  outline: 'var(--mantine-color-reed-7)',
  shelf: 'var(--mantine-color-reed-5)',
  stream: 'var(--mantine-color-blue-2)',
  weir: 'var(--mantine-color-clay-6)',
  soil: 'var(--mantine-color-clay-1)',
  liner: 'var(--mantine-color-stone-9)',
  underlayment: 'var(--mantine-color-stone-5)',
  gravel: 'var(--mantine-color-stone-3)',
  rock: 'var(--mantine-color-stone-5)',
  rockEdge: 'var(--mantine-color-stone-7)',
  dimension: 'var(--mantine-color-stone-6)',
  text: 'var(--mantine-color-stone-8)',
  halo: 'var(--mantine-color-white)',
} as const;

export type Projection = DrawingProjection & { width: number; height: number };

/**
 * Fits a drawing's bounds (ft) into `DRAWING_WIDTH`. `yUp` flips the y axis for elevations
 * (cross-sections); plans keep y down the page. `verticalScale` stretches heights (1 keeps the
 * proportions).
 */
export function fitDrawing(bounds: BoundsFt, yUp: boolean, verticalScale = 1): Projection {
  const { spanXFt, spanYFt } = spansOf(bounds);
  const perFt = (DRAWING_WIDTH - 2 * PAD_X) / spanXFt;
  const projection = projectDrawing(bounds, {
    perFt,
    originX: PAD_X,
    originY: PAD_Y,
    yUp,
    verticalScale,
  });
  return {
    ...projection,
    width: DRAWING_WIDTH,
    height: Math.round(spanYFt * projection.perFtY + 2 * PAD_Y),
  };
}

export { depthExaggeration };

/** An SVG path through points, closed when `closed`. */
export function pathOf(points: readonly PointFt[], view: Projection, closed = false): string {
  if (points.length === 0) return '';
  const d = points
    .map((p, i) => {
      const { x, y } = view.at(p);
      return `${i === 0 ? 'M' : 'L'}${x.toFixed(1)} ${y.toFixed(1)}`;
    })
    .join(' ');
  return closed ? `${d} Z` : d;
}

/** Text with a light halo so it stays legible over lines and fills. */
export function Label({
  x,
  y,
  children,
  anchor = 'middle',
}: {
  x: number;
  y: number;
  children: string;
  anchor?: 'start' | 'middle' | 'end';
}) {
  return (
    <text
      x={x}
      y={y}
      fontSize={LABEL_SIZE}
      textAnchor={anchor}
      dominantBaseline="middle"
      fill={DRAWING_COLORS.text}
      stroke={DRAWING_COLORS.halo}
      strokeWidth={3}
      paintOrder="stroke"
      strokeLinejoin="round"
    >
      {children}
    </text>
  );
}

/** A dimension line with end ticks and its label: on a horizontal line, beside a vertical one. */
export function Dimension({ dimension, view }: { dimension: DimensionLine; view: Projection }) {
  const a = view.at(dimension.fromFt);
  const b = view.at(dimension.toFt);
  const vertical = Math.abs(a.x - b.x) < Math.abs(a.y - b.y);
  const tick = 5;
  const ticks = vertical
    ? [a, b].map((p) => `M${p.x - tick} ${p.y} L${p.x + tick} ${p.y}`)
    : [a, b].map((p) => `M${p.x} ${p.y - tick} L${p.x} ${p.y + tick}`);
  const midX = (a.x + b.x) / 2;
  const midY = (a.y + b.y) / 2;
  const onLeft = vertical && a.x < view.width / 3;
  return (
    <g data-dimension={dimension.kind}>
      <path
        d={`M${a.x} ${a.y} L${b.x} ${b.y} ${ticks.join(' ')}`}
        stroke={DRAWING_COLORS.dimension}
        strokeWidth={1}
        fill="none"
      />
      {vertical ? (
        <Label x={onLeft ? midX - 7 : midX + 7} y={midY} anchor={onLeft ? 'end' : 'start'}>
          {dimension.label}
        </Label>
      ) : (
        <Label x={midX} y={midY}>
          {dimension.label}
        </Label>
      )}
    </g>
  );
}
