// What a link shows once the quote was answered: the acceptance or the decline, the payment step, a
// change order and the final invoice; one chunk for all (see deferred-parts.tsx).
export { AcceptedPanel, DeclinedPanel } from './answer-panels';
export { ChangeAnsweredPanel, ChangeOrderSection } from './change-order';
export { InvoiceSection } from './invoice-section';
export { PaymentPanel } from './payment-panel';
