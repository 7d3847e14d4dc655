/** Every request goes to the same origin; the dev server and production host proxy `/api`. */
export const API_BASE_PATH = '/api';

export const PRODUCT_NAME = 'Pondwright';
