import { Group, Paper, Text, Title } from '@mantine/core';
import { defaultEngineParameters, toDisplay, type Takeoff } from '@pondwright/shared/engine';
import { formatNumber } from '../utils/format-quantity';

const WIDTH = 600;
const HEIGHT = 240;
const PAD = { left: 44, right: 12, top: 10, bottom: 32 };
const PUMPS = defaultEngineParameters.hydraulics.pumps;
const FLOW_EXPONENT = defaultEngineParameters.hydraulics.hazenWilliamsFlowExponent;

function niceStep(range: number, ticks: number): number {
  const raw = range / ticks;
  const power = 10 ** Math.floor(Math.log10(raw));
  const steps = [1, 2, 2.5, 5, 10];
  return (steps.find((s) => s * power >= raw) ?? 10) * power;
}

const COLORS = {
  pump: 'var(--mantine-color-stone-4)',
  best: 'var(--mantine-color-reed-7)',
  system: 'var(--mantine-color-clay-6)',
  grid: 'var(--mantine-color-stone-2)',
  text: 'var(--mantine-color-stone-7)',
};

/**
 * The candidate pumps' curves against the system curve. Friction follows Hazen–Williams, so the
 * system curve is the static lift plus the friction at the required flow scaled by (Q / Q_req)^1.852.
 */
export function PumpChart({ takeoff }: { takeoff: Takeoff }) {
  const h = takeoff.hydraulics;
  if (!h) return null;
  const system = takeoff.unitSystem;
  const candidates = h.candidates
    .map((c) => ({ ...c, curve: PUMPS.find((p) => p.id === c.pumpId)?.curve ?? [] }))
    .filter((c) => c.curve.length > 1);
  if (candidates.length === 0) return null;

  const maxFlow = Math.max(
    h.requiredFlowGph,
    ...candidates.flatMap((c) => c.curve.map((p) => p.flowGph)),
  );
  const maxHead =
    Math.max(
      h.totalDynamicHeadAtRequiredFt,
      ...candidates.flatMap((c) => c.curve.map((p) => p.headFt)),
    ) * 1.05;
  const friction = h.totalDynamicHeadAtRequiredFt - h.staticHeadFt;
  const systemHead = (q: number) =>
    h.staticHeadFt +
    (h.requiredFlowGph > 0 ? friction * (q / h.requiredFlowGph) ** FLOW_EXPONENT : 0);

  const x = (q: number) => PAD.left + (q / maxFlow) * (WIDTH - PAD.left - PAD.right);
  const y = (ft: number) =>
    HEIGHT - PAD.bottom - (Math.min(ft, maxHead) / maxHead) * (HEIGHT - PAD.top - PAD.bottom);

  const systemPoints = Array.from({ length: 41 }, (_, i) => (maxFlow * i) / 40)
    .filter((q) => systemHead(q) <= maxHead)
    .map((q) => `${x(q)},${y(systemHead(q))}`)
    .join(' ');

  const flowStep = niceStep(maxFlow, 5);
  const headStep = niceStep(maxHead, 4);
  const flowTicks = Array.from(
    { length: Math.floor(maxFlow / flowStep) + 1 },
    (_, i) => i * flowStep,
  );
  const headTicks = Array.from(
    { length: Math.floor(maxHead / headStep) + 1 },
    (_, i) => i * headStep,
  );
  const flowUnit = toDisplay(0, 'gph', system).unit;
  const headUnit = toDisplay(0, 'headFt', system).unit;
  const best = h.best;

  return (
    <Paper p="sm" component="figure" m={0}>
      <Title order={3} fz="h5" mb={4}>
        Pumps against the system curve
      </Title>
      <svg
        viewBox={`0 0 ${WIDTH} ${HEIGHT}`}
        width="100%"
        role="img"
        aria-label={
          best
            ? `Pump curves against the system curve; ${best.label} meets it at ${formatNumber(toDisplay(best.flowGph, 'gph', system).value)} ${flowUnit}.`
            : 'Pump curves against the system curve; none reaches the required flow.'
        }
      >
        {headTicks.map((t) => (
          <g key={`h${t}`}>
            <line x1={PAD.left} x2={WIDTH - PAD.right} y1={y(t)} y2={y(t)} stroke={COLORS.grid} />
            <text x={PAD.left - 6} y={y(t) + 4} fontSize={11} textAnchor="end" fill={COLORS.text}>
              {formatNumber(toDisplay(t, 'headFt', system).value)}
            </text>
          </g>
        ))}
        {flowTicks.map((t) => (
          <text
            key={`q${t}`}
            x={x(t)}
            y={HEIGHT - PAD.bottom + 14}
            fontSize={11}
            textAnchor="middle"
            fill={COLORS.text}
          >
            {formatNumber(toDisplay(t, 'gph', system).value)}
          </text>
        ))}
        <text
          x={WIDTH - PAD.right}
          y={HEIGHT - 4}
          fontSize={11}
          textAnchor="end"
          fill={COLORS.text}
        >
          flow ({flowUnit})
        </text>
        <text
          x={4}
          y={PAD.top + 2}
          fontSize={11}
          fill={COLORS.text}
          dominantBaseline="hanging"
          transform={`rotate(-90 4 ${PAD.top + 2})`}
          textAnchor="end"
        >
          head ({headUnit})
        </text>
        <line
          x1={x(h.requiredFlowGph)}
          x2={x(h.requiredFlowGph)}
          y1={PAD.top}
          y2={HEIGHT - PAD.bottom}
          stroke={COLORS.system}
          strokeDasharray="2 4"
        />
        {candidates
          .filter((c) => c.pumpId !== best?.pumpId)
          .map((c) => (
            <polyline
              key={c.pumpId}
              points={c.curve.map((p) => `${x(p.flowGph)},${y(p.headFt)}`).join(' ')}
              fill="none"
              stroke={COLORS.pump}
              strokeWidth={1.5}
            />
          ))}
        {candidates
          .filter((c) => c.pumpId === best?.pumpId)
          .map((c) => (
            <polyline
              key={c.pumpId}
              points={c.curve.map((p) => `${x(p.flowGph)},${y(p.headFt)}`).join(' ')}
              fill="none"
              stroke={COLORS.best}
              strokeWidth={3}
            />
          ))}
        <polyline
          points={systemPoints}
          fill="none"
          stroke={COLORS.system}
          strokeWidth={2}
          strokeDasharray="6 4"
        />
        {candidates.map(
          (c) =>
            c.operating && (
              <circle
                key={c.pumpId}
                cx={x(c.operating.flowGph)}
                cy={y(c.operating.headFt)}
                r={c.pumpId === best?.pumpId ? 5 : 3}
                fill={c.pumpId === best?.pumpId ? COLORS.best : COLORS.pump}
              />
            ),
        )}
      </svg>
      <Group gap="md" component="figcaption">
        <Legend
          color={COLORS.best}
          label={best ? `${best.label} (best)` : 'No pump reaches the flow'}
          thick
        />
        <Legend color={COLORS.pump} label="Other candidates" />
        <Legend color={COLORS.system} label="System curve; dotted line: required flow" dashed />
      </Group>
    </Paper>
  );
}

function Legend({
  color,
  label,
  thick,
  dashed,
}: {
  color: string;
  label: string;
  thick?: boolean;
  dashed?: boolean;
}) {
  return (
    <Group gap={6} wrap="nowrap">
      <svg width={22} height={8} aria-hidden>
        <line
          x1={0}
          x2={22}
          y1={4}
          y2={4}
          stroke={color}
          strokeWidth={thick ? 3 : 2}
          strokeDasharray={dashed ? '6 4' : undefined}
        />
      </svg>
      <Text size="xs" c="dimmed">
        {label}
      </Text>
    </Group>
  );
}
