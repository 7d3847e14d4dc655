import type { CrewBudgetLine, JobView } from '@pondwright/shared';
import type { QuantityKind } from './log-values';

export type CrewLine = CrewBudgetLine;

/**
 * The job as the daily log needs it: the plan's quantities and never its money. Owners and estimators
 * get `budget` with prices from the server; it is dropped here, before anything renders or is kept on
 * the phone.
 */
export function toCrewJob(job: JobView): JobView {
  const crewBudget =
    job.crewBudget.length > 0
      ? job.crewBudget
      : (job.budget?.lines ?? []).map(
          ({ id, category, description, code, task, quantity, unit }) => ({
            id,
            category,
            description,
            code,
            task,
            quantity,
            unit,
          }),
        );
  return { ...job, budget: null, crewBudget };
}

const CATEGORY: Record<QuantityKind, CrewBudgetLine['category']> = {
  material: 'materials',
  equipment: 'equipment',
  disposal: 'disposal',
};

export function linesFor(lines: CrewLine[], kind: QuantityKind): CrewLine[] {
  return lines.filter((line) => line.category === CATEGORY[kind]);
}

/** Which budget line a saved row came from: the same code and words, else the first with the code. */
export function matchLine(
  lines: CrewLine[],
  kind: QuantityKind,
  code: string | null,
  description: string,
): string | null {
  if (code === null) return null;
  const candidates = linesFor(lines, kind).filter((line) => line.code === code);
  return (
    candidates.find((line) => line.description === description)?.id ?? candidates[0]?.id ?? null
  );
}
