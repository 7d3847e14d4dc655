/**
 * Input labels by field name, with the unit the engine expects. The form and the error summary share
 * them; a measurement input swaps in the metric unit when the form is in metric.
 */
export const FIELD_LABELS: Record<string, string> = {
  unitSystem: 'Units',
  shape: 'Outline',
  lengthFt: 'Length (ft)',
  widthFt: 'Width (ft)',
  pointsFt: 'Outline points',
  xFt: 'x (ft)',
  yFt: 'y (ft)',
  maxDepthFt: 'Max depth (ft)',
  wallStyle: 'Walls',
  widthIn: 'Width (in)',
  depthIn: 'Depth below water (in)',
  dropFt: 'Drop (ft)',
  weirWidthIn: 'Weir width (in)',
  sheet: 'Sheet of water',
  depthFt: 'Depth (ft)',
  fill: 'Filled with',
  pipeMaterial: 'Pipe material',
  pressurePipeLengthFt: 'Pressure pipe length (ft)',
  pressurePipeSizeIn: 'Pressure pipe size (in)',
  suctionPipeLengthFt: 'Suction pipe length (ft)',
  suctionPipeSizeIn: 'Suction pipe size (in)',
  elbow90: '90° elbows',
  elbow45: '45° elbows',
  tee: 'Tees',
  checkValve: 'Check valves',
  valve: 'Other valves',
  elevationFt: 'Lift, water surface to highest weir (ft)',
  boulderMixPct: 'Boulder mix',
  small: 'Small boulders (%)',
  medium: 'Medium boulders (%)',
  large: 'Large boulders (%)',
  wallCoveragePct: 'Walls covered (%)',
  shelfCoveragePct: 'Shelves covered (%)',
  streamEdgeCoveragePct: 'Stream edges covered (%)',
  floorGravelDepthIn: 'Floor gravel (in)',
  shelfGravelDepthIn: 'Shelf gravel (in)',
  streamGravelDepthIn: 'Stream gravel (in)',
  cableLengthFt: 'Cable length (ft)',
  gaugeAwg: 'Cable gauge (AWG)',
  fixtureWatts: 'Fixtures',
  soil: 'Soil',
  accessWidthIn: 'Narrowest access (in)',
  carryDistanceFt: 'Carry distance (ft)',
  slopePct: 'Slope (%)',
  excavationMethod: 'Digging',
  haulVehicleId: 'Haul vehicle',
  spoilHauledPct: 'Spoil hauled away (%)',
  basinsAlreadyExcavated: 'Basins already dug',
  oldLinerAreaSqFt: 'Old liner to remove (ft²)',
  oldRockShortTons: 'Old rock on site (tons)',
  rockReusedPct: 'Old rock reused (%)',
  size: 'Crew size',
  hoursPerDay: 'Hours per day',
};

const PARTS: Record<string, string> = {
  basins: 'Basin',
  shelves: 'Shelf',
  pointsFt: 'Point',
  streams: 'Stream',
  waterfalls: 'Waterfall',
  lighting: 'Lighting run',
  fixtureWatts: 'Fixture',
};

const SECTIONS: Record<string, string> = {
  basins: 'Basins',
  streams: 'Streams',
  waterfalls: 'Waterfalls',
  pondFreeBasin: 'Pond-free basin',
  pumpRun: 'Pump run',
  fittings: 'Fittings',
  rock: 'Rock and gravel',
  lighting: 'Lighting',
  site: 'Site',
  renovation: 'Renovation',
  crew: 'Crew',
  outline: 'Outline',
};

const stripUnit = (label: string) => label.replace(/ \([^)]*\)$/, '');

/** "basins.0.shelves.1.depthIn" → "Basin 1 › Shelf 2 › Depth below water". */
export function describeField(path: string): string {
  const segments = path.split('.');
  const words: string[] = [];
  segments.forEach((segment, i) => {
    const next = segments[i + 1];
    if (/^\d+$/.test(segment)) return;
    if (next !== undefined && /^\d+$/.test(next) && PARTS[segment]) {
      words.push(`${PARTS[segment]} ${Number(next) + 1}`);
    } else if (i === segments.length - 1 && FIELD_LABELS[segment]) {
      words.push(stripUnit(FIELD_LABELS[segment]));
    } else {
      words.push(SECTIONS[segment] ?? FIELD_LABELS[segment] ?? segment);
    }
  });
  return words.join(' › ');
}
