import type { PlanDrawing } from '@pondwright/shared/drawings';
import { useId } from 'react';
import { Dimension, DRAWING_COLORS, fitDrawing, Label, LABEL_SIZE, pathOf } from './drawing-parts';

/**
 * Draws a computed plan (top) view: outlines, shelf lips, streams and weirs, with overall dimensions.
 * A pure renderer of drawing data (types only from the shared package), so the homeowner's quote page,
 * which gets the drawing from the server, never loads the takeoff engine.
 */
export function PlanSvg({ plan }: { plan: PlanDrawing }) {
  const id = useId();
  const view = fitDrawing(plan.boundsFt, false);
  const summary = plan.basins
    .map(
      (b) =>
        `Basin ${b.index + 1}: ${b.lengthLabel} long, ${b.widthLabel} wide, ${b.shelves.length === 1 ? 'one shelf' : `${b.shelves.length} shelves`}.`,
    )
    .concat(plan.streams.map((s) => `Stream ${s.index + 1}: ${s.label}.`))
    .concat(plan.weirs.map((w) => `Waterfall ${w.index + 1}: ${w.label}.`))
    .join(' ');
  const approximate = plan.basins.some((b) => b.shelves.some((s) => !s.exact));

  return (
    <svg
      viewBox={`0 0 ${view.width} ${view.height}`}
      width="100%"
      role="img"
      aria-label={`Plan view. ${summary}`}
      aria-describedby={`${id}-desc`}
      style={{ display: 'block', maxHeight: '70vh' }}
    >
      <title id={`${id}-title`}>Plan view</title>
      <desc id={`${id}-desc`}>
        {summary}
        {approximate ? ' Shelf lines of outlines that bend inward are approximate.' : ''}
      </desc>
      {plan.streams.map((s) => (
        <path
          key={`stream-${s.index}`}
          d={pathOf(s.bandFt, view, true)}
          fill={DRAWING_COLORS.stream}
          stroke={DRAWING_COLORS.waterLine}
          strokeWidth={1.5}
        />
      ))}
      {plan.basins.map((b) => (
        <g key={`basin-${b.index}`}>
          <path
            d={pathOf(b.outlineFt, view, true)}
            fill={DRAWING_COLORS.water}
            stroke={DRAWING_COLORS.outline}
            strokeWidth={2.5}
            data-part="outline"
          />
          {b.shelves.map((s, k) => (
            <path
              key={`shelf-${k}`}
              d={pathOf(s.edgeFt, view, true)}
              fill="none"
              stroke={DRAWING_COLORS.shelf}
              strokeWidth={1.5}
              strokeDasharray={s.exact ? '6 4' : '2 4'}
              data-part="shelf"
            />
          ))}
          {b.floor && (
            <path
              d={pathOf(b.floor.outlineFt, view, true)}
              fill="none"
              stroke={DRAWING_COLORS.shelf}
              strokeWidth={1}
              data-part="floor"
            />
          )}
        </g>
      ))}
      {plan.streams.map((s) => {
        const below = view.at(s.bandFt[3]!);
        return (
          <Label
            key={`stream-label-${s.index}`}
            x={below.x + 4}
            y={below.y + LABEL_SIZE}
            anchor="start"
          >
            {`stream ${s.label}`}
          </Label>
        );
      })}
      {plan.weirs.map((w) => {
        const a = view.at(w.fromFt);
        const b = view.at(w.toFt);
        return (
          <line
            key={`weir-${w.index}`}
            x1={a.x}
            y1={a.y}
            x2={b.x}
            y2={b.y}
            stroke={DRAWING_COLORS.weir}
            strokeWidth={5}
            strokeLinecap="round"
            data-part="weir"
          >
            <title>{`Waterfall ${w.index + 1}: ${w.label}`}</title>
          </line>
        );
      })}
      {plan.dimensions.map((d, i) => (
        <Dimension key={`${d.kind}-${i}`} dimension={d} view={view} />
      ))}
    </svg>
  );
}
