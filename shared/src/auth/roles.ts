import { z } from 'zod';

/** The three roles a company member can hold; one role per user. */
export const ROLES = ['owner', 'estimator', 'crew_lead'] as const;
export const roleSchema = z.enum(ROLES);
export type Role = z.infer<typeof roleSchema>;

export const ROLE_LABELS: Record<Role, string> = {
  owner: 'Owner',
  estimator: 'Estimator',
  crew_lead: 'Crew lead',
};
