import { pumpChartData, type FlowHeadPoint } from '@pondwright/shared/drawings';
import { toDisplay, type PumpCandidate, type Takeoff } from '@pondwright/shared/engine';
import { useId, useMemo } from 'react';
import { DRAWING_COLORS, Label, LABEL_SIZE } from './drawing-parts';

const WIDTH = 400;
const PLOT = { left: 52, right: 12, top: 12, bottom: 40 };
const PLOT_HEIGHT = 200;
const LEGEND_HEIGHT = 44;
const HEIGHT = PLOT.top + PLOT_HEIGHT + PLOT.bottom + LEGEND_HEIGHT;

const COLORS = {
  pump: 'var(--mantine-color-stone-4)',
  best: 'var(--mantine-color-reed-7)',
  system: 'var(--mantine-color-clay-6)',
  grid: 'var(--mantine-color-stone-2)',
};

const number = new Intl.NumberFormat('en-US', { maximumFractionDigits: 2 });

type PumpChartProps = {
  takeoff: Takeoff;
  /** The pump catalogue the takeoff used; the engine's defaults when not given. */
  pumps?: readonly PumpCandidate[];
};

/** Each candidate pump's curve, the system curve, the required flow and the operating points. */
export function PumpChart({ takeoff, pumps }: PumpChartProps) {
  const id = useId();
  const chart = useMemo(() => pumpChartData(takeoff, pumps), [takeoff, pumps]);
  if (!chart || chart.candidates.length === 0) return null;
  const system = takeoff.unitSystem;
  const flowUnit = toDisplay(0, 'gph', system).unit;
  const headUnit = toDisplay(0, 'headFt', system).unit.replace(' of head', '');
  const x = (flowGph: number) =>
    PLOT.left + (flowGph / chart.maxFlowGph) * (WIDTH - PLOT.left - PLOT.right);
  const y = (headFt: number) =>
    PLOT.top + PLOT_HEIGHT - (Math.min(headFt, chart.maxHeadFt) / chart.maxHeadFt) * PLOT_HEIGHT;
  const line = (points: readonly FlowHeadPoint[]) =>
    points
      .map((p, i) => `${i === 0 ? 'M' : 'L'}${x(p.flowGph).toFixed(1)} ${y(p.headFt).toFixed(1)}`)
      .join(' ');
  const flow = (gph: number) => number.format(toDisplay(gph, 'gph', system).value);
  const head = (ft: number) => number.format(toDisplay(ft, 'headFt', system).value);
  const best = chart.candidates.find((c) => c.best);
  const ordered = [...chart.candidates.filter((c) => !c.best), ...(best ? [best] : [])];
  const summary = best?.operating
    ? `${chart.candidates.length} candidate pumps against the system curve. The required flow is ${flow(chart.requiredFlowGph)} ${flowUnit}; ${best.label} runs at ${flow(best.operating.flowGph)} ${flowUnit} and ${head(best.operating.headFt)} ${headUnit} of head.`
    : `${chart.candidates.length} candidate pumps against the system curve; none reaches the required flow of ${flow(chart.requiredFlowGph)} ${flowUnit}.`;
  const legendY = PLOT.top + PLOT_HEIGHT + PLOT.bottom + 8;
  const legend = [
    {
      label: best ? `${best.label} (best)` : 'no pump reaches the flow',
      color: COLORS.best,
      width: 3,
    },
    { label: 'other pumps', color: COLORS.pump, width: 1.5 },
    { label: 'system curve', color: COLORS.system, width: 2, dash: '6 4' },
    { label: 'required flow', color: COLORS.system, width: 1.5, dash: '2 4' },
  ];

  return (
    <svg
      viewBox={`0 0 ${WIDTH} ${HEIGHT}`}
      width="100%"
      role="img"
      aria-label={summary}
      aria-describedby={`${id}-desc`}
      style={{ display: 'block' }}
    >
      <title>Pump curves against the system curve</title>
      <desc id={`${id}-desc`}>{summary}</desc>
      {chart.headTicksFt.map((t) => (
        <g key={`h${t}`}>
          <line x1={PLOT.left} x2={WIDTH - PLOT.right} y1={y(t)} y2={y(t)} stroke={COLORS.grid} />
          <text
            x={PLOT.left - 6}
            y={y(t)}
            fontSize={12}
            textAnchor="end"
            dominantBaseline="middle"
            fill={DRAWING_COLORS.text}
          >
            {head(t)}
          </text>
        </g>
      ))}
      {chart.flowTicksGph.map((t) => (
        <text
          key={`q${t}`}
          x={x(t)}
          y={PLOT.top + PLOT_HEIGHT + 14}
          fontSize={12}
          textAnchor="middle"
          fill={DRAWING_COLORS.text}
        >
          {flow(t)}
        </text>
      ))}
      <text
        x={WIDTH - PLOT.right}
        y={PLOT.top + PLOT_HEIGHT + 32}
        fontSize={12}
        textAnchor="end"
        fill={DRAWING_COLORS.text}
      >
        {`flow (${flowUnit})`}
      </text>
      <text
        x={12}
        y={PLOT.top + PLOT_HEIGHT / 2}
        fontSize={12}
        textAnchor="middle"
        fill={DRAWING_COLORS.text}
        transform={`rotate(-90 12 ${PLOT.top + PLOT_HEIGHT / 2})`}
      >
        {`head (${headUnit})`}
      </text>
      <line
        x1={x(chart.requiredFlowGph)}
        x2={x(chart.requiredFlowGph)}
        y1={PLOT.top}
        y2={PLOT.top + PLOT_HEIGHT}
        stroke={COLORS.system}
        strokeDasharray="2 4"
        strokeWidth={1.5}
        data-series="required-flow"
      />
      {ordered.map((c) => (
        <path
          key={c.pumpId}
          d={line(c.curve)}
          fill="none"
          stroke={c.best ? COLORS.best : COLORS.pump}
          strokeWidth={c.best ? 3 : 1.5}
          data-series="pump"
        >
          <title>{c.label}</title>
        </path>
      ))}
      <path
        d={line(chart.system)}
        fill="none"
        stroke={COLORS.system}
        strokeWidth={2}
        strokeDasharray="6 4"
        data-series="system"
      />
      {ordered.map(
        (c) =>
          c.operating && (
            <circle
              key={`op-${c.pumpId}`}
              cx={x(c.operating.flowGph)}
              cy={y(c.operating.headFt)}
              r={c.best ? 5 : 3}
              fill={c.best ? COLORS.best : COLORS.pump}
              data-series="operating-point"
            />
          ),
      )}
      {best?.operating && (
        <Label
          x={Math.min(x(best.operating.flowGph) + 8, WIDTH - PLOT.right)}
          y={y(best.operating.headFt) - 12}
          anchor={x(best.operating.flowGph) > WIDTH * 0.6 ? 'end' : 'start'}
        >
          {`${flow(best.operating.flowGph)} ${flowUnit}`}
        </Label>
      )}
      {legend.map((item, i) => {
        const lx = i % 2 === 0 ? PLOT.left : PLOT.left + (WIDTH - PLOT.left) / 2;
        const ly = legendY + Math.floor(i / 2) * (LABEL_SIZE + 6);
        return (
          <g key={item.label}>
            <line
              x1={lx}
              x2={lx + 22}
              y1={ly}
              y2={ly}
              stroke={item.color}
              strokeWidth={item.width}
              strokeDasharray={item.dash}
            />
            <text
              x={lx + 28}
              y={ly}
              fontSize={12}
              dominantBaseline="middle"
              fill={DRAWING_COLORS.text}
            >
              {item.label}
            </text>
          </g>
        );
      })}
    </svg>
  );
}
