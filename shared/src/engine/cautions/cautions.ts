import { fmt } from '../explain/explanation';
import type { EngineParameters } from '../parameters/parameters-schema';
import type { TakeoffInput } from '../schemas/takeoff-input';
import type { Caution, Takeoff } from '../schemas/takeoff-output';

export type CautionFacts = {
  input: TakeoffInput;
  params: EngineParameters;
  bankCuYd: number;
  handWork: boolean;
  heavyStone: boolean;
  velocityWarnings: Array<{ side: 'pressure' | 'suction'; velocity: number; limit: number }>;
  noPump: boolean;
  requiredFlowGph: number;
  tdhFt: number;
  lowVoltageRuns: Array<{ index: number; volts: number }>;
  overCurrentRuns: Array<{ index: number; amps: number }>;
  transformerCount: number;
  reservoir: Takeoff['reservoir'];
  seamCount: number;
};

const one = (v: number, d = 1) => fmt(v, d);

/**
 * Warnings (the design does not work as entered) and cautions (safety and code matters that always
 * defer to local codes, the inspector and licensed professionals), in a stable order.
 * Sources: TRADE.md "Cautions to show"; REFERENCES 5.7–5.8 (velocity), 7.2–7.10 (electrical, locates).
 */
export function buildCautions(f: CautionFacts): Caution[] {
  const out: Caution[] = [];
  const { input, params } = f;
  for (const w of f.velocityWarnings) {
    out.push({
      code: w.side === 'pressure' ? 'velocity-high-pressure' : 'velocity-high-suction',
      severity: 'warning',
      message: `Water moves at ${one(w.velocity, 2)} ft/s in the ${w.side} line, above the ${one(w.limit)} ft/s limit: use a larger pipe.`,
      field: w.side === 'pressure' ? 'pumpRun.pressurePipeSizeIn' : 'pumpRun.suctionPipeSizeIn',
    });
  }
  if (f.noPump) {
    out.push({
      code: 'no-pump-reaches-flow',
      severity: 'warning',
      message: `No pump in the catalogue delivers ${one(f.requiredFlowGph, 0)} gph against ${one(f.tdhFt, 2)} ft of head. Use larger pipe, fewer fittings, two pumps, or a larger pump.`,
      field: 'pumpRun',
    });
  }
  for (const run of f.lowVoltageRuns) {
    out.push({
      code: 'fixture-voltage-low',
      severity: 'warning',
      message: `Only ${one(run.volts, 2)} V reaches the last fixture of run ${run.index + 1} (at least ${one(params.lighting.minFixtureVolts)} V wanted): use heavier cable, a shorter run, fewer fixtures or a higher transformer tap.`,
      field: `lighting.${run.index}.gaugeAwg`,
    });
  }
  for (const run of f.overCurrentRuns) {
    out.push({
      code: 'lighting-circuit-current-high',
      severity: 'warning',
      message: `Run ${run.index + 1} carries ${one(run.amps, 2)} A; a low-voltage lighting circuit is limited to ${one(params.lighting.maxCircuitAmps)} A (NEC Article 411): split the run.`,
      field: `lighting.${run.index}.fixtureWatts`,
    });
  }
  if (f.transformerCount > 1) {
    out.push({
      code: 'several-transformers',
      severity: 'caution',
      message: `The lighting load needs ${f.transformerCount} transformers; split the runs between them.`,
      field: 'lighting',
    });
  }
  if (f.reservoir && !f.reservoir.adequate) {
    out.push({
      code: 'reservoir-too-small',
      severity: 'warning',
      message: `The pond-free basin holds ${one(f.reservoir.capacityGallons, 0)} gal but must hold ${one(f.reservoir.requiredGallons, 0)} gal of drain-back: make it larger or deeper, or use water storage blocks.`,
      field: 'pondFreeBasin',
    });
  }
  if (f.seamCount > 0) {
    out.push({
      code: 'liner-seams',
      severity: 'caution',
      message: `The liner is wider than the widest sheet and needs ${f.seamCount} seam(s); seam with the maker's tape and primer, and keep seams out of the waterfall and stream where possible.`,
      field: null,
    });
  }
  input.basins.forEach((basin, i) => {
    if (basin.maxDepthFt * 12 >= params.cautions.barrierDepthIn) {
      out.push({
        code: 'barrier-depth',
        severity: 'caution',
        message: `Basin ${i + 1} is ${one(basin.maxDepthFt * 12, 0)} in deep. A toddler can drown in very little water; many local codes require a barrier or a permit from depths such as 18, 24 or 36 in. Check the local code before you build.`,
        field: `basins.${i}.maxDepthFt`,
      });
    }
  });
  const deepest = Math.max(
    0,
    ...input.basins.map((b) => b.maxDepthFt),
    input.pondFreeBasin?.depthFt ?? 0,
  );
  if (deepest >= params.cautions.protectiveSystemDepthFt) {
    out.push({
      code: 'excavation-protective-system',
      severity: 'warning',
      message: `The dig reaches ${one(deepest, 1)} ft. In the US an excavation ${one(params.cautions.protectiveSystemDepthFt)} ft or deeper needs a protective system (sloping, benching, shoring or a shield); keep spoil at least 2 ft from the edge. Follow the federal and local excavation rules.`,
      field: null,
    });
  }
  if (f.bankCuYd > 0) {
    out.push({
      code: 'utility-locates',
      severity: 'caution',
      message:
        'Request utility locates before digging (811 in the US), a few working days ahead; keep the ticket and hand-dig near the marks. Private lines such as irrigation, drains and lighting wire are not marked.',
      field: null,
    });
  }
  if (input.pumpRun !== null || input.lighting.length > 0) {
    out.push({
      code: 'gfci',
      severity: 'caution',
      message:
        'Pumps, lights and outlets near water need GFCI protection and protected cable runs; line-voltage work is for a licensed electrician. Defer to the local code and the inspector.',
      field: null,
    });
  }
  if (f.heavyStone) {
    out.push({
      code: 'heavy-stone',
      severity: 'caution',
      message: `Some boulders weigh more than about ${one(params.rock.heavyStoneLb, 0)} lb: get help or a machine, and mind pinch and crush points.`,
      field: 'rock.boulderMixPct',
    });
  }
  if (f.handWork && f.bankCuYd > 0) {
    out.push({
      code: 'hand-dig',
      severity: 'caution',
      message: `The access is too narrow for a machine: ${one(f.bankCuYd, 1)} yd³ is dug and carried by hand. Plan the crew so digging does not exhaust it before the rock work.`,
      field: 'site.accessWidthIn',
    });
  }
  return out;
}
