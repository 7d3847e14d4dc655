import type { QuoteInvoiceView } from '@pondwright/shared';
import type { Invoice } from './entities/invoice.entity';

export function invoiceView(invoice: Invoice): QuoteInvoiceView {
  return {
    issuedAt: invoice.issuedAt.toISOString(),
    total: invoice.total,
    depositPaid: invoice.depositPaid,
    balance: invoice.balance,
    status: invoice.status,
    paidAt: invoice.paidAt?.toISOString() ?? null,
  };
}
