/** Rows that belong to one company carry its id; the tenant repository scopes every query by it. */
export type CompanyOwned = { companyId: string };
