// The accept and decline forms, one chunk for both (see deferred-parts.tsx).
export { AcceptForm } from './accept-form';
export { DeclineForm } from './decline-form';
