import { z } from 'zod';
import { SOIL_TYPES } from '../engine/parameters/parameters-schema';

const text = (label: string, max: number) =>
  z
    .string({ error: `${label} must be text` })
    .trim()
    .max(max, `${label} must be at most ${max} characters`);

const optionalText = (label: string, max: number) => text(label, max).optional();

/** A measured quantity the crew may not know yet: a number within range, or null for "not recorded". */
const measure = (label: string, unit: string, max: number) =>
  z
    .number({ error: `${label} must be a number` })
    .finite(`${label} must be a number`)
    .gt(0, `${label} must be more than 0 ${unit}`)
    .max(max, `${label} must be at most ${max} ${unit}`)
    .nullable();

const yesNoUnknown = (label: string) =>
  z.boolean({ error: `${label} must be yes, no or unknown` }).nullable();

export const customerNameSchema = text('Name', 160).min(1, 'Enter the customer’s name');
export const customerPhoneSchema = text('Phone', 40);
export const customerEmailSchema = z
  .string({ error: 'E-mail must be text' })
  .trim()
  .max(254, 'E-mail must be at most 254 characters')
  .toLowerCase()
  .refine((value) => value === '' || z.email().safeParse(value).success, {
    error: 'Enter a valid e-mail address, or leave it empty',
  });
export const customerNotesSchema = text('Notes', 4000);

/** The takeoff engine's soil types, offered for a site. */
export const SITE_SOIL_TYPES = SOIL_TYPES;
export const soilSchema = z
  .enum(SOIL_TYPES, { error: `Soil must be one of: ${SOIL_TYPES.join(', ')}` })
  .nullable();

export const siteLabelSchema = text('Label', 80);
export const siteAddressLineSchema = text('Address', 200).min(1, 'Enter the site’s address');
export const siteCitySchema = text('Town', 100);
export const siteRegionSchema = text('Region', 100);
export const sitePostalCodeSchema = text('Postal code', 20);
export const accessWidthInSchema = measure('Access width', 'in', 600);
export const carryDistanceFtSchema = measure('Carry distance', 'ft', 2000);
export const slopePctSchema = z
  .number({ error: 'Slope must be a number' })
  .finite('Slope must be a number')
  .min(0, 'Slope must be 0 % or more')
  .max(100, 'Slope must be at most 100 %')
  .nullable();
export const waterAvailableSchema = yesNoUnknown('Water available');
export const powerAvailableSchema = yesNoUnknown('Power available');
export const utilitiesLocatedSchema = z.boolean({ error: 'Utilities located must be yes or no' });
export const siteNotesSchema = text('Site notes', 4000);

/** Everything about a site; only the address is required. */
export const createSiteSchema = z
  .object({
    label: siteLabelSchema.optional(),
    addressLine: siteAddressLineSchema,
    city: siteCitySchema.optional(),
    region: siteRegionSchema.optional(),
    postalCode: sitePostalCodeSchema.optional(),
    accessWidthIn: accessWidthInSchema.optional(),
    carryDistanceFt: carryDistanceFtSchema.optional(),
    slopePct: slopePctSchema.optional(),
    soil: soilSchema.optional(),
    waterAvailable: waterAvailableSchema.optional(),
    powerAvailable: powerAvailableSchema.optional(),
    utilitiesLocated: utilitiesLocatedSchema.optional(),
    notes: siteNotesSchema.optional(),
  })
  .strict();
export type CreateSiteInput = z.infer<typeof createSiteSchema>;

export const updateSiteSchema = createSiteSchema.partial().strict();
export type UpdateSiteInput = z.infer<typeof updateSiteSchema>;

export const createCustomerSchema = z
  .object({
    name: customerNameSchema,
    phone: optionalText('Phone', 40),
    email: customerEmailSchema.optional(),
    notes: optionalText('Notes', 4000),
  })
  .strict();
export type CreateCustomerInput = z.infer<typeof createCustomerSchema>;

export const updateCustomerSchema = createCustomerSchema.partial().strict();
export type UpdateCustomerInput = z.infer<typeof updateCustomerSchema>;

export const CUSTOMER_SORTS = ['name', 'createdAt', 'updatedAt'] as const;
export type CustomerSort = (typeof CUSTOMER_SORTS)[number];
export const SORT_ORDERS = ['asc', 'desc'] as const;
export type SortOrder = (typeof SORT_ORDERS)[number];

export const customerSearchSchema = text('Search', 100);
export const customerSortSchema = z.enum(CUSTOMER_SORTS, {
  error: `Sort by one of: ${CUSTOMER_SORTS.join(', ')}`,
});
export const sortOrderSchema = z.enum(SORT_ORDERS, { error: 'Order must be asc or desc' });
/** Query strings arrive as text; pages are whole numbers from 1. */
export const pageSchema = z.coerce
  .number({ error: 'Page must be a whole number' })
  .int('Page must be a whole number')
  .min(1, 'Page must be 1 or more')
  .max(100_000, 'Page must be at most 100000');
export const pageSizeSchema = z.coerce
  .number({ error: 'Page size must be a whole number' })
  .int('Page size must be a whole number')
  .min(10, 'Page size must be between 10 and 100')
  .max(100, 'Page size must be between 10 and 100');

export const customerListQuerySchema = z.object({
  q: customerSearchSchema.optional(),
  sort: customerSortSchema.default('name'),
  order: sortOrderSchema.default('asc'),
  page: pageSchema.default(1),
  pageSize: pageSizeSchema.default(25),
});
export type CustomerListQuery = z.infer<typeof customerListQuerySchema>;

export type CustomerSummary = {
  id: string;
  name: string;
  phone: string;
  email: string;
  siteCount: number;
  createdAt: string;
  updatedAt: string;
};

export type SiteView = {
  id: string;
  customerId: string;
  label: string;
  addressLine: string;
  city: string;
  region: string;
  postalCode: string;
  accessWidthIn: number | null;
  carryDistanceFt: number | null;
  slopePct: number | null;
  soil: (typeof SOIL_TYPES)[number] | null;
  waterAvailable: boolean | null;
  powerAvailable: boolean | null;
  utilitiesLocated: boolean;
  notes: string;
  createdAt: string;
  updatedAt: string;
};

export type CustomerDetail = CustomerSummary & { notes: string; sites: SiteView[] };

export type CustomerPage = {
  items: CustomerSummary[];
  total: number;
  page: number;
  pageSize: number;
};
