import type { JobView } from '@pondwright/shared';
import { readLoadVolume } from '../storage/load-size-store';

/**
 * The load size a new disposal row in loads starts with: the last one logged on this job (the truck
 * or container hired for it, whoever logged it), else the last one this phone's user saved, else none,
 * so the first load is sized on purpose rather than guessed.
 */
export function defaultLoadVolume(job: Pick<JobView, 'logs'> | null, userId: string): string {
  const logs = [...(job?.logs ?? [])].sort((a, b) => a.logDate.localeCompare(b.logDate));
  let fromJob: string | null = null;
  for (const log of logs) {
    for (const entry of log.entries) {
      if (entry.kind === 'disposal' && entry.loadVolumeLooseCubicYards !== undefined) {
        fromJob = entry.loadVolumeLooseCubicYards;
      }
    }
  }
  return fromJob ?? readLoadVolume(userId) ?? '';
}
