import { z } from 'zod';
import { UNIT_SYSTEMS } from '../engine/units/display';
import { companyNameSchema } from '../auth/auth-schemas';

export const unitSystemSchema = z.enum(UNIT_SYSTEMS, { error: 'Choose US customary or metric' });

/** What an owner may change about the company; every field optional, at least one given. */
export const updateCompanySchema = z
  .object({
    name: companyNameSchema.optional(),
    unitSystem: unitSystemSchema.optional(),
  })
  .refine((change) => change.name !== undefined || change.unitSystem !== undefined, {
    error: 'Change the name or the unit system',
  });
export type UpdateCompanyInput = z.infer<typeof updateCompanySchema>;

/**
 * The company as every member sees it: its name, the units new estimates start in, and whether it has
 * a logo (served by `GET /api/company/logo`, shown on quotes).
 */
export type CompanyProfile = {
  id: string;
  name: string;
  unitSystem: z.infer<typeof unitSystemSchema>;
  hasLogo: boolean;
};
