import type { Role } from '@pondwright/shared';

/**
 * The demo scenario: an invented company and invented people, for trying Pondwright out. None of these
 * names stand for a real business or person.
 */
export const DEMO_COMPANY_NAME = 'Heronmoss Water Gardens';

export const DEMO_USERS: ReadonlyArray<{
  email: string;
  name: string;
  role: Role;
  password: string;
}> = [
  {
    email: 'owner@heronmoss.example',
    name: 'Ada Quillfeather',
    role: 'owner',
    password: 'pond-owner-2026',
  },
  {
    email: 'estimator@heronmoss.example',
    name: 'Tomas Reedley',
    role: 'estimator',
    password: 'pond-estimator-2026',
  },
  {
    email: 'crew@heronmoss.example',
    name: 'Marisol Fenwick',
    role: 'crew_lead',
    password: 'pond-crew-2026',
  },
];
