import type { Explanation, LaborTask, Takeoff } from '@pondwright/shared/engine';
import { formatNumber, formatQuantity, show } from './format-quantity';

export const LABOR_TASK_LABELS: Record<LaborTask, string> = {
  excavation: 'Excavation',
  rockPlacing: 'Rock and gravel',
  linerUnderlayment: 'Liner and underlayment',
  plumbingEquipment: 'Plumbing and equipment',
  electricalLighting: 'Electrical and lighting',
  renovationTearOut: 'Tear-out',
  cleanUp: 'Clean-up',
};

export type KeyFigure = {
  key: string;
  label: string;
  value: string;
  detail?: string;
  explanation?: Explanation;
};

export type FigureGroup = { title: string; figures: KeyFigure[] };

const plural = (count: number, one: string, many = `${one}s`) =>
  `${formatNumber(count)} ${count === 1 ? one : many}`;

/**
 * The engine's label for a figure, with its task ids spelled out in words ("Labor, rockPlacing" →
 * "Labor, rock and gravel").
 */
export function explanationLabel(explanation: Explanation, takeoff: Takeoff): string {
  const task = /^labor\.tasks\.(\d+)\.laborHours$/.exec(explanation.figure);
  const id = task ? takeoff.labor.tasks[Number(task[1])]?.task : undefined;
  return id ? `Labor, ${LABOR_TASK_LABELS[id].toLowerCase()}` : explanation.label;
}

/** The key figures of a takeoff, grouped as an estimator reads them, in the takeoff's unit system. */
export function keyFigureGroups(takeoff: Takeoff): FigureGroup[] {
  const system = takeoff.unitSystem;
  const byFigure = new Map(takeoff.explanations.map((e) => [e.figure, e]));
  const explained = (figure: string, overrides: Partial<KeyFigure> = {}): KeyFigure | null => {
    const explanation = byFigure.get(figure);
    if (!explanation) return null;
    return {
      key: figure,
      label: explanationLabel(explanation, takeoff),
      value: formatQuantity(explanation.display),
      explanation,
      ...overrides,
    };
  };
  const present = (figures: Array<KeyFigure | null>) =>
    figures.filter((f): f is KeyFigure => f !== null);
  const groups: FigureGroup[] = [];

  groups.push({
    title: 'Water',
    figures: present([
      explained('water.surfaceAreaSqFt'),
      explained('water.volumeGallons', {
        detail:
          takeoff.water.rockSolidCuFt + takeoff.water.gravelSolidCuFt > 0
            ? `After ${show(takeoff.water.rockSolidCuFt + takeoff.water.gravelSolidCuFt, 'cuFt', system)} of rock and gravel`
            : undefined,
      }),
    ]),
  });

  const { liner } = takeoff;
  groups.push({
    title: 'Liner',
    figures: present([
      ...liner.pieces.map((piece, i) => {
        const widths = piece.panelWidthsFt.map((w) => show(w, 'ft', system).split(' ')[0]);
        const length = show(piece.panelLengthFt, 'ft', system);
        const seams =
          piece.seamCount === 0
            ? 'no seams'
            : `${plural(piece.seamCount, 'seam')}, ${show(piece.seamLengthFt, 'ft', system)} in all`;
        return explained(`liner.pieces.${i}.orderedAreaSqFt`, {
          value: `${widths.join(' + ')} × ${length}`,
          detail: `${show(piece.orderedAreaSqFt, 'sqFt', system)} ordered, ${seams}`,
        });
      }),
      explained('liner.underlaymentAreaSqFt'),
      explained('liner.weightLb', { detail: 'Plan two or more people to place it' }),
    ]),
  });

  const dig = takeoff.excavation;
  groups.push({
    title: 'Excavation',
    figures: present([
      explained('excavation.bankCuYd', {
        detail: dig.method === 'hand' ? 'Dug by hand' : 'Dug by machine',
      }),
      explained('excavation.looseCuYd', { detail: `Swell × ${formatNumber(dig.swellFactor)}` }),
      explained('excavation.haulLoads', {
        detail:
          dig.wheelbarrowTrips !== null
            ? `${plural(dig.wheelbarrowTrips, 'wheelbarrow trip')} to the truck`
            : `${show(dig.hauledLooseCuYd, 'cuYd', system)} hauled`,
      }),
    ]),
  });

  const rock = takeoff.rock;
  groups.push({
    title: 'Rock and gravel',
    figures: present([
      explained('rock.bouldersShortTons.small'),
      explained('rock.bouldersShortTons.medium'),
      explained('rock.bouldersShortTons.large'),
      {
        key: 'rock.bouldersToBuyShortTons',
        label: rock.reusedShortTons > 0 ? 'Boulders to buy' : 'Boulders, total',
        value: show(rock.bouldersToBuyShortTons, 'shortTon', system),
        detail:
          rock.reusedShortTons > 0
            ? `${show(rock.bouldersShortTons.total, 'shortTon', system)} placed, ${show(rock.reusedShortTons, 'shortTon', system)} reused`
            : undefined,
      },
      explained('rock.gravelShortTons', {
        detail: `${show(rock.gravelBulkCuYd, 'cuYd', system)} bulk`,
      }),
    ]),
  });

  if (takeoff.reservoir) {
    const r = takeoff.reservoir;
    groups.push({
      title: 'Pond-free basin',
      figures: present([
        explained('reservoir.capacityGallons', {
          detail: r.adequate ? 'Enough for the drain-back' : 'Too small for the drain-back',
        }),
        explained('reservoir.requiredGallons'),
      ]),
    });
  }

  const h = takeoff.hydraulics;
  if (h) {
    groups.push({
      title: 'Pump and plumbing',
      figures: present([
        explained('hydraulics.requiredFlowGph', {
          detail: `Turnover ${show(h.turnoverFlowGph, 'gph', system)}, weirs ${show(h.weirFlowGph, 'gph', system)}`,
        }),
        explained('hydraulics.totalDynamicHeadAtRequiredFt', {
          detail: `Static lift ${show(h.staticHeadFt, 'headFt', system)} + friction`,
        }),
        ...h.lines.map((line, i) =>
          explained(`hydraulics.lines.${i}.nominalSizeIn`, {
            label: line.side === 'pressure' ? 'Pressure pipe' : 'Suction pipe',
            value: `${formatNumber(line.nominalSizeIn)} in`,
            detail: `${show(line.velocityAtRequiredFtPerS, 'ftPerS', system)} at the required flow${line.chosen === 'auto' ? ', sized automatically' : ''}`,
          }),
        ),
        h.best
          ? explained('hydraulics.best.flowGph', {
              label: 'Best pump',
              value: h.best.label,
              detail: `Runs at ${show(h.best.flowGph, 'gph', system)} against ${show(h.best.headFt, 'headFt', system)}, ${show(h.best.inputWatts, 'watt', system)}`,
            })
          : {
              key: 'hydraulics.best',
              label: 'Best pump',
              value: 'None reaches the flow',
              detail: 'See the warnings below',
            },
        explained('hydraulics.best.yearlyEnergyKwh'),
      ]),
    });
  }

  const lighting = takeoff.lighting;
  if (lighting) {
    groups.push({
      title: 'Lighting',
      figures: present([
        explained('lighting.transformerSizeWatts', {
          value:
            lighting.transformerCount > 1
              ? `${lighting.transformerCount} × ${show(lighting.transformerSizeWatts, 'watt', system)}`
              : show(lighting.transformerSizeWatts, 'watt', system),
          detail: `${show(lighting.totalWatts, 'watt', system)} of fixtures, loaded ${formatNumber(lighting.loadPercent)} %`,
        }),
        ...lighting.runs.map((run, i) =>
          explained(`lighting.runs.${i}.voltageAtLastFixtureV`, {
            label: `Run ${i + 1}, last fixture`,
            detail: `${show(run.currentAmps, 'amp', system)}, ${formatNumber(run.dropPercent)} % drop`,
          }),
        ),
      ]),
    });
  }

  return groups.filter((group) => group.figures.length > 0);
}

/** Labor-hours by task with their explanations, then the total. */
export function laborRows(takeoff: Takeoff): KeyFigure[] {
  return takeoff.labor.tasks.map((line, i) => {
    const explanation = takeoff.explanations.find(
      (e) => e.figure === `labor.tasks.${i}.laborHours`,
    );
    return {
      key: `labor.tasks.${i}`,
      label: LABOR_TASK_LABELS[line.task],
      value: show(line.laborHours, 'hour', takeoff.unitSystem),
      explanation,
    };
  });
}
