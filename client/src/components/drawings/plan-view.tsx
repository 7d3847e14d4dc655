import { planDrawing } from '@pondwright/shared/drawings';
import type { TakeoffInput } from '@pondwright/shared/engine';
import { useMemo } from 'react';
import { PlanSvg } from './plan-svg';

/** The plan (top) view of a takeoff's measurements: computes the drawing, then draws it. */
export function PlanView({ input }: { input: TakeoffInput }) {
  const plan = useMemo(() => planDrawing(input), [input]);
  return <PlanSvg plan={plan} />;
}
