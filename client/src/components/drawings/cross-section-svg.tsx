import type { CrossSection } from '@pondwright/shared/drawings';
import { useId } from 'react';
import { depthExaggeration, Dimension, DRAWING_COLORS, fitDrawing, pathOf } from './drawing-parts';

/**
 * Draws a computed cross-section of a basin along its length: shelves, liner and overlap,
 * underlayment, rock and gravel. A pure renderer of drawing data (types only from the shared
 * package), so the homeowner's quote page never loads the takeoff engine.
 */
export function CrossSectionSvg({ section }: { section: CrossSection }) {
  const id = useId();
  const basinIndex = section.basinIndex;
  const stretch = depthExaggeration(section.boundsFt);
  const view = fitDrawing(section.boundsFt, true, stretch);
  const label = (kind: string) =>
    section.dimensions
      .filter((d) => d.kind === kind)
      .map((d) => d.label)
      .join(', ');
  const shelves = label('shelf-depth');
  const summary = `Cross-section of basin ${basinIndex + 1} along its ${label('length')} length: ${
    shelves ? `shelves at ${shelves}, ` : ''
  }${label('max-depth')} deep, liner with ${label('overlap')} at each edge over underlayment, rock on the walls and shelves, gravel on the floor.${
    stretch > 1 ? ` Depths drawn ${stretch} times their scale.` : ''
  }`;

  return (
    <svg
      viewBox={`0 0 ${view.width} ${view.height}`}
      width="100%"
      role="img"
      aria-label={summary}
      aria-describedby={`${id}-desc`}
      style={{ display: 'block' }}
    >
      <title id={`${id}-title`}>{`Cross-section of basin ${basinIndex + 1}`}</title>
      <desc id={`${id}-desc`}>{summary}</desc>
      <path d={pathOf(section.soilFt, view, true)} fill={DRAWING_COLORS.soil} data-part="soil" />
      <path
        d={pathOf(section.profileFt, view, true)}
        fill={DRAWING_COLORS.water}
        data-part="water"
      />
      <line
        {...(() => {
          const a = view.at({ xFt: 0, yFt: 0 });
          const b = view.at({ xFt: section.lengthFt, yFt: 0 });
          return { x1: a.x, y1: a.y, x2: b.x, y2: b.y };
        })()}
        stroke={DRAWING_COLORS.waterLine}
        strokeWidth={1.5}
        data-part="water-line"
      />
      {section.gravelFt.map((band, i) => (
        <path
          key={`gravel-${i}`}
          d={pathOf(band, view, true)}
          fill={DRAWING_COLORS.gravel}
          stroke={DRAWING_COLORS.underlayment}
          strokeWidth={0.5}
          strokeDasharray="1 2"
          data-part="gravel"
        />
      ))}
      {section.rocks.map((rock, i) => {
        const c = view.at(rock.centerFt);
        return (
          <ellipse
            key={`rock-${i}`}
            cx={c.x}
            cy={c.y}
            rx={rock.radiusFt * view.perFtX}
            ry={rock.radiusFt * view.perFtY}
            fill={DRAWING_COLORS.rock}
            stroke={DRAWING_COLORS.rockEdge}
            strokeWidth={1}
            data-part="rock"
          />
        );
      })}
      <path
        d={pathOf(section.underlaymentFt, view)}
        fill="none"
        stroke={DRAWING_COLORS.underlayment}
        strokeWidth={1.5}
        strokeDasharray="4 3"
        data-part="underlayment"
      />
      <path
        d={pathOf(section.linerFt, view)}
        fill="none"
        stroke={DRAWING_COLORS.liner}
        strokeWidth={2.5}
        strokeLinejoin="round"
        data-part="liner"
      />
      {section.dimensions.map((d, i) => (
        <Dimension key={`${d.kind}-${i}`} dimension={d} view={view} />
      ))}
    </svg>
  );
}
