import { defaultEngineParameters, type TakeoffInput } from '@pondwright/shared/engine';
import { formatMeasurement, formatShownNumber } from './measurement';

export const FORM_SECTIONS = [
  { value: 'basins', title: 'Basins', fields: ['basins'] },
  {
    value: 'water',
    title: 'Streams, waterfalls, pond-free basin',
    fields: ['streams', 'waterfalls', 'pondFreeBasin'],
  },
  { value: 'pump', title: 'Pump run', fields: ['pumpRun'] },
  { value: 'rock', title: 'Rock and gravel', fields: ['rock'] },
  { value: 'lighting', title: 'Lighting', fields: ['lighting'] },
  { value: 'site', title: 'Site and renovation', fields: ['site', 'renovation'] },
  { value: 'crew', title: 'Crew', fields: ['crew'] },
] as const;

export type FormSection = (typeof FORM_SECTIONS)[number]['value'];

/** The form section holding the field at a dotted path, e.g. `pumpRun.elevationFt` → `pump`. */
export function sectionOf(path: string): FormSection | null {
  const top = path.split('.')[0];
  const section = FORM_SECTIONS.find((s) => (s.fields as readonly string[]).includes(top ?? ''));
  return section?.value ?? null;
}

const plural = (count: number, one: string, many = `${one}s`) =>
  `${count} ${count === 1 ? one : many}`;

/** A one-line reminder of what a closed section holds, in the form's unit system. */
export function sectionSummary(section: FormSection, values: TakeoffInput): string {
  const system = values.unitSystem;
  const ft = (value: unknown) => formatMeasurement(value, 'ft', system);
  switch (section) {
    case 'basins': {
      const [first] = values.basins;
      if (!first) return 'None';
      if (values.basins.length > 1) return plural(values.basins.length, 'basin');
      const plan =
        first.outline.shape === 'freeform'
          ? `freeform, ${first.outline.pointsFt.length} points`
          : `${first.outline.shape} ${formatShownNumber(first.outline.lengthFt, 'ft', system)} × ${ft(first.outline.widthFt)}`;
      return `${plan}, ${ft(first.maxDepthFt)} deep, ${plural(first.shelves.length, 'shelf', 'shelves')}`;
    }
    case 'water': {
      const parts = [
        plural(values.streams.length, 'stream'),
        plural(values.waterfalls.length, 'waterfall'),
      ];
      if (values.pondFreeBasin) parts.push('pond-free basin');
      return parts.join(', ');
    }
    case 'pump':
      return values.pumpRun
        ? `${ft(values.pumpRun.pressurePipeLengthFt)} of pipe, ${ft(values.pumpRun.elevationFt)} lift`
        : 'None';
    case 'rock': {
      const mix = values.rock.boulderMixPct;
      return `Mix ${mix.small} / ${mix.medium} / ${mix.large} %`;
    }
    case 'lighting': {
      if (values.lighting.length === 0) return 'None';
      const fixtures = values.lighting.reduce((sum, run) => sum + run.fixtureWatts.length, 0);
      return `${plural(values.lighting.length, 'run')}, ${plural(fixtures, 'fixture')}`;
    }
    case 'site': {
      const soil =
        defaultEngineParameters.soils[values.site.soil]?.label ?? String(values.site.soil);
      const access = formatMeasurement(values.site.accessWidthIn, 'in', system);
      return `${soil}, ${access} access${values.renovation ? ', renovation' : ''}`;
    }
    case 'crew':
      return `${plural(Number(values.crew.size) || 0, 'person', 'people')} × ${values.crew.hoursPerDay} h`;
  }
}
