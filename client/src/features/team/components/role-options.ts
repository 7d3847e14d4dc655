import { ROLE_LABELS, ROLES } from '@pondwright/shared';

export const roleOptions = ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));
