import { fmt } from '../explain/explanation';
import type { EngineParameters, SoilType } from '../parameters/parameters-schema';

export const LABOR_TASKS = [
  'excavation',
  'rockPlacing',
  'linerUnderlayment',
  'plumbingEquipment',
  'electricalLighting',
  'renovationTearOut',
  'cleanUp',
] as const;
export type LaborTask = (typeof LABOR_TASKS)[number];

export type LaborQuantities = {
  soil: SoilType;
  handWork: boolean;
  bankCuYd: number;
  looseCuYd: number;
  carryDistanceFt: number;
  slopeFactor: number;
  carryFactor: number;
  boulderShortTons: number;
  gravelShortTons: number;
  linerOrderedSqFt: number;
  seamLengthFt: number;
  pipeLengthFt: number;
  fittingCount: number;
  pumpSets: number;
  fixtureCount: number;
  cableLengthFt: number;
  transformerCount: number;
  oldLinerSqFt: number;
  oldRockShortTons: number;
};

export type LaborLine = { task: LaborTask; laborHours: number; formula: string; workings: string };

const f = (v: number) => fmt(v, 3);

/**
 * Labor-hours per task from production rates × quantities × site factors. Hand digging: bank yd³ ×
 * (dig + load rate by soil) + loose yd³ × wheel rate × max(1, carry / rated distance); machine digging:
 * bank yd³ / machine rate + bank yd³ × trim rate; both × slope factor. Rock: tons × placing rates ×
 * slope × carry factors. The other tasks use working defaults; clean-up is a share of the rest. Hours;
 * not rounded. Sources: REFERENCES 8.1–8.5 and the defaults' comments.
 */
export function laborHours(q: LaborQuantities, params: EngineParameters): LaborLine[] {
  const soil = params.soils[q.soil];
  const x = params.excavation;
  const l = params.labor;
  const lines: LaborLine[] = [];
  if (q.handWork) {
    const wheelScale = Math.max(1, q.carryDistanceFt / x.wheelRateDistanceFt);
    const hours =
      (q.bankCuYd * (soil.handDigLaborHoursPerBankCuYd + soil.handLoadLaborHoursPerBankCuYd) +
        q.looseCuYd * x.wheelSpreadLaborHoursPerLooseCuYd * wheelScale) *
      q.slopeFactor;
    lines.push({
      task: 'excavation',
      laborHours: hours,
      formula:
        '(bank yd³ × (dig + load rate) + loose yd³ × wheel rate × max(1, carry / rated distance)) × slope factor',
      workings: `(${f(q.bankCuYd)} × (${f(soil.handDigLaborHoursPerBankCuYd)} + ${f(soil.handLoadLaborHoursPerBankCuYd)}) + ${f(q.looseCuYd)} × ${f(x.wheelSpreadLaborHoursPerLooseCuYd)} × ${f(wheelScale)}) × ${f(q.slopeFactor)} = ${f(hours)} h`,
    });
  } else {
    const hours =
      (q.bankCuYd / x.machineBankCuYdPerHour + q.bankCuYd * x.machineTrimLaborHoursPerBankCuYd) *
      q.slopeFactor;
    lines.push({
      task: 'excavation',
      laborHours: hours,
      formula: '(bank yd³ / machine yd³ per hour + bank yd³ × trim rate) × slope factor',
      workings: `(${f(q.bankCuYd)} / ${f(x.machineBankCuYdPerHour)} + ${f(q.bankCuYd)} × ${f(x.machineTrimLaborHoursPerBankCuYd)}) × ${f(q.slopeFactor)} = ${f(hours)} h`,
    });
  }
  const boulderRate = q.handWork
    ? l.boulderHandLaborHoursPerShortTon
    : l.boulderMachineLaborHoursPerShortTon;
  const rockHours =
    (q.boulderShortTons * boulderRate + q.gravelShortTons * l.gravelLaborHoursPerShortTon) *
    q.slopeFactor *
    q.carryFactor;
  lines.push({
    task: 'rockPlacing',
    laborHours: rockHours,
    formula:
      '(boulder tons × placing rate + gravel tons × spreading rate) × slope factor × carry factor',
    workings: `(${f(q.boulderShortTons)} × ${f(boulderRate)} + ${f(q.gravelShortTons)} × ${f(l.gravelLaborHoursPerShortTon)}) × ${f(q.slopeFactor)} × ${f(q.carryFactor)} = ${f(rockHours)} h`,
  });
  const linerHours =
    (q.linerOrderedSqFt / 100) * l.linerLaborHoursPer100SqFt +
    q.seamLengthFt * l.seamLaborHoursPerFt;
  lines.push({
    task: 'linerUnderlayment',
    laborHours: linerHours,
    formula: 'ordered liner ft² / 100 × rate + seam ft × seam rate',
    workings: `${f(q.linerOrderedSqFt)} / 100 × ${f(l.linerLaborHoursPer100SqFt)} + ${f(q.seamLengthFt)} × ${f(l.seamLaborHoursPerFt)} = ${f(linerHours)} h`,
  });
  const plumbingHours =
    q.pipeLengthFt * l.pipeLaborHoursPerFt +
    q.fittingCount * l.fittingLaborHoursEach +
    q.pumpSets * l.pumpSetLaborHours;
  lines.push({
    task: 'plumbingEquipment',
    laborHours: plumbingHours,
    formula: 'pipe ft × rate + fittings × rate + pump sets × hours per set',
    workings: `${f(q.pipeLengthFt)} × ${f(l.pipeLaborHoursPerFt)} + ${q.fittingCount} × ${f(l.fittingLaborHoursEach)} + ${q.pumpSets} × ${f(l.pumpSetLaborHours)} = ${f(plumbingHours)} h`,
  });
  const electricalHours =
    q.fixtureCount * l.fixtureLaborHoursEach +
    q.cableLengthFt * l.cableLaborHoursPerFt +
    q.transformerCount * l.transformerLaborHoursEach;
  lines.push({
    task: 'electricalLighting',
    laborHours: electricalHours,
    formula: 'fixtures × rate + cable ft × rate + transformers × rate',
    workings: `${q.fixtureCount} × ${f(l.fixtureLaborHoursEach)} + ${f(q.cableLengthFt)} × ${f(l.cableLaborHoursPerFt)} + ${q.transformerCount} × ${f(l.transformerLaborHoursEach)} = ${f(electricalHours)} h`,
  });
  const oldRockRate = q.handWork
    ? l.oldRockHandLaborHoursPerShortTon
    : l.oldRockMachineLaborHoursPerShortTon;
  const tearOutHours =
    ((q.oldLinerSqFt / 100) * l.linerRemovalLaborHoursPer100SqFt +
      q.oldRockShortTons * oldRockRate) *
    q.slopeFactor *
    q.carryFactor;
  lines.push({
    task: 'renovationTearOut',
    laborHours: tearOutHours,
    formula: '(old liner ft² / 100 × rate + old rock tons × rate) × slope factor × carry factor',
    workings: `(${f(q.oldLinerSqFt)} / 100 × ${f(l.linerRemovalLaborHoursPer100SqFt)} + ${f(q.oldRockShortTons)} × ${f(oldRockRate)}) × ${f(q.slopeFactor)} × ${f(q.carryFactor)} = ${f(tearOutHours)} h`,
  });
  const others = lines.reduce((sum, line) => sum + line.laborHours, 0);
  const cleanUp = others * l.cleanUpShareOfOtherHours;
  lines.push({
    task: 'cleanUp',
    laborHours: cleanUp,
    formula: 'share × hours of all other tasks',
    workings: `${f(l.cleanUpShareOfOtherHours)} × ${f(others)} = ${f(cleanUp)} h`,
  });
  return lines;
}

/** Crew-days: labor-hours / (crew size × hours per day). Not rounded. */
export function crewDays(totalLaborHours: number, crewSize: number, hoursPerDay: number): number {
  return totalLaborHours / (crewSize * hoursPerDay);
}
