import type { RescheduleReason } from '@pondwright/shared';

export const RESCHEDULE_REASON_LABELS: Record<RescheduleReason, string> = {
  weather: 'Weather',
  access: 'Site access',
  materials: 'Materials late or short',
  crew: 'Crew not available',
  homeowner: 'The homeowner asked',
  other: 'Something else',
};
