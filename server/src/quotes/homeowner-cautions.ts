import type { Takeoff } from '@pondwright/shared/engine';

/**
 * The safety notes a homeowner reads on the quote, chosen by what the feature has. Each defers to local
 * codes and licensed professionals; none replaces them.
 */
export function homeownerCautions(takeoff: Takeoff): string[] {
  const cautions: string[] = [];
  const hasPower = takeoff.hydraulics !== null || takeoff.lighting !== null;
  if (hasPower) {
    // Ground-fault protection for outdoor and pond equipment outlets: NFPA 70 (NEC) Art. 210.8 and
    // Art. 682 (natural and artificially made bodies of water), from memory: check the edition in force.
    cautions.push(
      'Electricity near water: pumps and lights must be on a ground-fault (GFCI) protected outdoor circuit. New circuits and outlets are wired by a licensed electrician to your local electrical code.',
    );
  }
  const deepestFt = Math.max(0, ...takeoff.basins.map((basin) => basin.maxDepthFt));
  if (deepestFt > 0) {
    // The depth at which codes start to treat a pond like a pool varies (often 18 to 24 in); from
    // memory, so the wording sends the homeowner to their own code rather than quoting a number as law.
    cautions.push(
      'Deep water and children: a small child can drown in a few inches of water. Many local codes require a fence or barrier around water deeper than about 18 to 24 in (45 to 60 cm); we will check yours with you before we build.',
    );
  }
  cautions.push(
    'Digging near utilities: buried power, gas, water and communication lines are marked by the free call-before-you-dig service before any excavation. Nobody digs until the marks are in place.',
  );
  if (takeoff.rock.bouldersShortTons.total > 0) {
    cautions.push(
      'Heavy stone: boulders are placed by the crew with the right equipment. Please keep children and pets away from the work area while stone is being moved.',
    );
  }
  return cautions;
}
