export * from './auth/roles';
export * from './auth/password-policy';
export * from './auth/auth-schemas';
export * from './company/company-schemas';
export * from './customers/customer-schemas';
export * from './estimates/estimate-schemas';
export * from './quotes/quote-schemas';
export * from './quotes/quote-totals';
