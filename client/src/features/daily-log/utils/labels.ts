import type { JobStatus, LogEntry } from '@pondwright/shared';
import type { LaborTask } from '@pondwright/shared/engine';

// A copy of the pricing package's task labels (a test keeps them equal, so the crew and the cost
// report use the same words): that entry point would bring the whole pricing engine, decimal maths
// and CSV included, into the phone's bundle for seven words.
export const TASK_LABELS: Record<LaborTask, string> = {
  excavation: 'Excavation',
  rockPlacing: 'Boulder and gravel placing',
  linerUnderlayment: 'Underlayment and liner',
  plumbingEquipment: 'Plumbing, pump, skimmer and filter box',
  electricalLighting: 'Low-voltage lighting',
  renovationTearOut: 'Tear-out of the old pond',
  cleanUp: 'Clean-up',
};

export const TASK_OPTIONS = Object.entries(TASK_LABELS).map(([value, label]) => ({ value, label }));

export type Movement = 'delivered' | 'used' | 'returned';

export const MOVEMENT_LABELS: Record<Movement, string> = {
  delivered: 'Delivered',
  used: 'Used',
  returned: 'Returned',
};

export type EntryKind = LogEntry['kind'];

export const KIND_LABELS: Record<EntryKind, string> = {
  hours: 'Hours',
  material: 'Materials',
  equipment: 'Equipment',
  disposal: 'Disposal',
};

export const JOB_STATUS_LABELS: Record<JobStatus, string> = {
  scheduled: 'Scheduled',
  in_progress: 'Under way',
  completed: 'Finished',
  closed: 'Closed',
};

/** Budget units as the price book writes them, and how a crew says them. */
const UNIT_LABELS: Record<string, string> = {
  'cu yd': 'yd³',
  'sq ft': 'sq ft',
  'short ton': 'tons',
  h: 'h',
  day: 'days',
  load: 'loads',
};

export function unitLabel(unit: string): string {
  return UNIT_LABELS[unit] ?? unit;
}
