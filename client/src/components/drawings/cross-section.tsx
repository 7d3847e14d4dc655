import { crossSection } from '@pondwright/shared/drawings';
import type { Takeoff, TakeoffInput } from '@pondwright/shared/engine';
import { useMemo } from 'react';
import { CrossSectionSvg } from './cross-section-svg';

type CrossSectionProps = { input: TakeoffInput; takeoff: Takeoff | null; basinIndex?: number };

/** A basin's cross-section from a takeoff's measurements: computes the drawing, then draws it. */
export function CrossSection({ input, takeoff, basinIndex = 0 }: CrossSectionProps) {
  const section = useMemo(
    () => crossSection(input, takeoff, { basinIndex }),
    [input, takeoff, basinIndex],
  );
  return section ? <CrossSectionSvg section={section} /> : null;
}
