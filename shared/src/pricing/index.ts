// Price books and pricing: pure functions from a takeoff and a price-book version to a priced estimate.
export * from './price-book-schema';
