/**
 * Disposal counted in truck or container loads. A load is converted to loose cubic yards by its
 * nominal capacity (the truck's or container's rated loose yd³), not by how full it really was: a load
 * is rarely filled exactly, so loads × capacity is an upper estimate of what was hauled.
 */

/** The largest load size a daily log takes, loose yd³: a 40 yd³ roll-off is the largest common container. */
export const MAX_LOAD_VOLUME_LOOSE_CU_YD = 40;

const normalized = (unit: string) =>
  unit.trim().toLowerCase().replace(/\./g, ' ').replace(/\s+/g, ' ').trim();

/** True for a unit counting loads: "load", "Loads", "truck load", "truckloads", "dumpster load". */
export function isLoadUnit(unit: string): boolean {
  return /^((truck|dumpster|container|trailer) ?)?loads?$/.test(normalized(unit));
}

/**
 * True for loose cubic yards as budgets and crews write them: "cu yd", "cu. yds", "yd³", "yd3", "cy",
 * "cubic yards", "loose yd³", "LCY". Bank cubic yards ("bcy", "bank cu yd") are in-place soil, which
 * swells when dug, so they are deliberately not matched.
 */
export function isLooseCubicYardUnit(unit: string): boolean {
  return /^(loose )?(cu ?yds?|cubic ?(yards?|yds?)|yds?[³3]|cy|lcy)( loose)?$/.test(
    normalized(unit),
  );
}
