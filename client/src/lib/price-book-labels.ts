import {
  LABOR_TASK_LABELS,
  type MaterialAttributes,
  type MaterialKind,
  type PriceCategory,
  type ProductionRates,
} from '@pondwright/shared/pricing';

export const SECTION_LABELS: Record<string, string> = {
  book: 'Book',
  material: 'Materials',
  labor: 'Labor',
  rate: 'Production rates',
  setting: 'Job settings',
  materials: 'Materials',
  laborRoles: 'Labor',
  equipment: 'Equipment',
  disposal: 'Disposal',
  productionRates: 'Production rates',
  settings: 'Job settings',
  policy: 'Policy',
  currency: 'Currency',
};

export const CATEGORY_LABELS: Record<PriceCategory, string> = {
  materials: 'Materials',
  labor: 'Labor',
  equipment: 'Equipment',
  disposal: 'Disposal',
  other: 'Other',
};

export const KIND_LABELS: Record<MaterialKind, string> = {
  liner: 'Liner',
  underlayment: 'Underlayment',
  boulder: 'Boulder',
  gravel: 'Gravel',
  pipe: 'Pipe',
  fitting: 'Fitting',
  skimmer: 'Skimmer',
  'filter-box': 'Waterfall filter box',
  pump: 'Pump',
  light: 'Light',
  transformer: 'Transformer',
  cable: 'Cable',
  'storage-block': 'Water storage block',
  plant: 'Plant',
  extra: 'Extra',
};

export const ATTRIBUTE_LABELS: Record<keyof MaterialAttributes, string> = {
  linerThicknessMil: 'Thickness (mil)',
  linerWeightLbPerSqFt: 'Weight (lb per sq ft)',
  boulderSize: 'Boulder size',
  pipeMaterial: 'Pipe material',
  nominalSizeIn: 'Nominal size (in)',
  fittingKind: 'Fitting kind',
  ratedFlowGph: 'Rated flow (gph)',
  pumpCurve: 'Pump curve',
  watts: 'Lamp power (W)',
  ratingWatts: 'Rating (W)',
  cableGaugeAwg: 'Cable gauge (AWG)',
};

export const PRODUCTION_RATE_LABELS: Record<keyof ProductionRates, string> = {
  machineBankCuYdPerHour: 'Machine digging (bank cu yd per hour)',
  boulderHandLaborHoursPerShortTon: 'Boulders by hand (hours per short ton)',
  boulderMachineLaborHoursPerShortTon: 'Boulders with a machine (hours per short ton)',
  gravelLaborHoursPerShortTon: 'Gravel (hours per short ton)',
  linerLaborHoursPer100SqFt: 'Liner and underlayment (hours per 100 sq ft)',
  pipeLaborHoursPerFt: 'Pipe (hours per ft)',
  fittingLaborHoursEach: 'Fittings (hours each)',
  pumpSetLaborHours: 'Setting a pump (hours)',
  fixtureLaborHoursEach: 'Light fixtures (hours each)',
  cableLaborHoursPerFt: 'Low-voltage cable (hours per ft)',
};

export const TASK_LABELS = LABOR_TASK_LABELS;

/** "Unit cost" for "unitCost"; the fallback for fields without a label of their own. */
export function fieldLabel(field: string): string {
  const [head, category] = field.split('.');
  if (head === 'markupPct' && category && category in CATEGORY_LABELS) {
    return `${CATEGORY_LABELS[category as PriceCategory]} markup %`;
  }
  const last = field.split('.').at(-1) ?? field;
  const known =
    (ATTRIBUTE_LABELS as Record<string, string>)[last] ??
    (PRODUCTION_RATE_LABELS as Record<string, string>)[last] ??
    (TASK_LABELS as Record<string, string>)[last];
  if (known) return known;
  const words = last.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}
