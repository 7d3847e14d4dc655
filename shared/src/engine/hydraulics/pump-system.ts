import type { EngineParameters, PumpCandidate } from '../parameters/parameters-schema';
import type { PumpRunInput } from '../schemas/takeoff-input';
import { gphToGpm, WATTS_PER_HORSEPOWER } from '../units/units';
import { equivalentLengthMultiplier, frictionFtPer100Ft, velocityFtPerS } from './hazen-williams';
import { fittingsEquivalentLength, type FittingsLength } from './fittings';
import { choosePipe, type PipeSpec } from './pipe-choice';
import { operatingPoint, type OperatingPoint } from './pump-curve';

export type PipeLine = {
  side: 'pressure' | 'suction';
  pipe: PipeSpec;
  chosen: 'auto' | 'given';
  lengthFt: number;
  fittings: FittingsLength | null;
  equivalentLengthFt: number;
};

export type CandidateResult = {
  pump: PumpCandidate;
  operating: OperatingPoint | null;
  meetsFlow: boolean;
};

export type PumpSystem = {
  lines: PipeLine[];
  staticHeadFt: number;
  /** Head loss coefficient: friction (ft) = Σ k_line · Q[gpm]^1.852. */
  frictionAt(flowGph: number): number;
  totalDynamicHeadAt(flowGph: number): number;
  candidates: CandidateResult[];
  best: CandidateResult | null;
};

/**
 * The pump run's system curve and the pump choice. Pipes are sized at the required flow (velocity
 * limits on each side); the system curve is TDH(Q) = static lift + Σ Hazen–Williams friction over pipe
 * length + fitting equivalent lengths (fittings on the pressure line). Each candidate pump's operating
 * point is where its curve meets that system curve; the best is the one that reaches the required flow
 * with the least input power. ft, gph, W; not rounded.
 * Returns the field errors when the material or a given size is not in the catalogue.
 */
export function pumpSystem(
  run: PumpRunInput,
  requiredGph: number,
  hydraulics: EngineParameters['hydraulics'],
):
  | { ok: true; system: PumpSystem }
  | { ok: false; errors: Array<{ field: string; message: string }> } {
  const k = {
    constant: hydraulics.hazenWilliamsConstant,
    flowExponent: hydraulics.hazenWilliamsFlowExponent,
    diameterExponent: hydraulics.hazenWilliamsDiameterExponent,
  };
  const requiredGpm = gphToGpm(requiredGph);
  const errors: Array<{ field: string; message: string }> = [];
  const sizes = hydraulics.pipes
    .filter((p) => p.material === run.pipeMaterial)
    .map((p) => p.nominalSizeIn);
  if (sizes.length === 0) {
    const materials = [...new Set(hydraulics.pipes.map((p) => p.material))].join(', ');
    return {
      ok: false,
      errors: [
        {
          field: 'pumpRun.pipeMaterial',
          message: `Not in the pipe catalogue; choose one of: ${materials}.`,
        },
      ],
    };
  }
  const pick = (
    side: 'pressure' | 'suction',
    size: number | 'auto',
    maxV: number,
    field: string,
  ) => {
    const pipe = choosePipe(run.pipeMaterial, size, requiredGpm, maxV, hydraulics.pipes);
    if (!pipe)
      errors.push({
        field,
        message: `No ${run.pipeMaterial} pipe of that size; sizes: ${sizes.join(', ')} in or "auto".`,
      });
    return pipe;
  };
  const pressurePipe = pick(
    'pressure',
    run.pressurePipeSizeIn,
    hydraulics.maxPressureVelocityFtPerS,
    'pumpRun.pressurePipeSizeIn',
  );
  const suctionPipe =
    run.suctionPipeLengthFt > 0
      ? pick(
          'suction',
          run.suctionPipeSizeIn,
          hydraulics.maxSuctionVelocityFtPerS,
          'pumpRun.suctionPipeSizeIn',
        )
      : null;
  if (!pressurePipe || errors.length > 0) return { ok: false, errors };

  const multiplier = equivalentLengthMultiplier(
    pressurePipe.hazenWilliamsC,
    hydraulics.fittingTableC,
    k.flowExponent,
  );
  const fittings = fittingsEquivalentLength(
    run.fittings,
    pressurePipe.nominalSizeIn,
    multiplier,
    hydraulics.fittingEquivalentLengthsFt,
  );
  const lines: PipeLine[] = [
    {
      side: 'pressure',
      pipe: pressurePipe,
      chosen: run.pressurePipeSizeIn === 'auto' ? 'auto' : 'given',
      lengthFt: run.pressurePipeLengthFt,
      fittings,
      equivalentLengthFt: run.pressurePipeLengthFt + fittings.equivalentLengthFt,
    },
  ];
  if (suctionPipe) {
    lines.push({
      side: 'suction',
      pipe: suctionPipe,
      chosen: run.suctionPipeSizeIn === 'auto' ? 'auto' : 'given',
      lengthFt: run.suctionPipeLengthFt,
      fittings: null,
      equivalentLengthFt: run.suctionPipeLengthFt,
    });
  }
  const frictionAt = (flowGph: number) =>
    lines.reduce(
      (sum, line) =>
        sum +
        (frictionFtPer100Ft(
          gphToGpm(flowGph),
          line.pipe.insideDiameterIn,
          line.pipe.hazenWilliamsC,
          k,
        ) *
          line.equivalentLengthFt) /
          100,
      0,
    );
  const totalDynamicHeadAt = (flowGph: number) => run.elevationFt + frictionAt(flowGph);
  const candidates = hydraulics.pumps.map((pump) => {
    const operating = operatingPoint(pump, totalDynamicHeadAt);
    return {
      pump,
      operating,
      meetsFlow: operating !== null && operating.flowGph >= requiredGph - 1e-6,
    };
  });
  const meeting = candidates.filter((c) => c.meetsFlow);
  const best = meeting.reduce<CandidateResult | null>(
    (winner, c) =>
      winner === null || c.operating!.inputWatts < winner.operating!.inputWatts ? c : winner,
    null,
  );
  return {
    ok: true,
    system: {
      lines,
      staticHeadFt: run.elevationFt,
      frictionAt,
      totalDynamicHeadAt,
      candidates,
      best,
    },
  };
}

/** Hydraulic (water) power, W: Q[gpm] × H[ft] / 3960 hp × 745.7 W/hp. Standard (REFERENCES 4.6). */
export function hydraulicWatts(flowGph: number, headFt: number): number {
  return ((gphToGpm(flowGph) * headFt) / 3960) * WATTS_PER_HORSEPOWER;
}

/** Velocity in a line at a flow, ft/s (REFERENCES 5.6). */
export function lineVelocity(line: PipeLine, flowGph: number): number {
  return velocityFtPerS(gphToGpm(flowGph), line.pipe.insideDiameterIn);
}
