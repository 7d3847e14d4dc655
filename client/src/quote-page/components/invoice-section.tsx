import type { QuoteInvoiceView, QuoteView } from '@pondwright/shared';
import type { PaymentReturn } from '../lib/location';
import { formatDay, formatMoney, isZeroMoney } from '../lib/format';
import { PaymentPanel } from './payment-panel';
import { MoneyRows, Section } from './section';

type InvoiceSectionProps = {
  view: QuoteView;
  invoice: QuoteInvoiceView;
  token: string;
  paymentReturn: PaymentReturn;
  confirming: boolean;
  waitedOut: boolean;
  onCheckAgain: () => void;
};

/** The job's final invoice: the total, the deposit already paid, the balance, and paying it. */
export function InvoiceSection({ view, invoice, token, ...payment }: InvoiceSectionProps) {
  const money = (amount: string) => formatMoney(amount, view.currency);
  const paid = invoice.status === 'paid';
  return (
    <Section title="Your final invoice">
      <div className="qp-stack">
        <p className="qp-sm">
          {paid
            ? `Issued ${formatDay(invoice.issuedAt)}. Thank you for having ${view.company.name} build your project.`
            : `Issued ${formatDay(invoice.issuedAt)}. The work is finished — here’s what’s left to pay.`}
        </p>
        <MoneyRows
          label="Your final invoice"
          rows={[
            {
              label: 'Project total, tax included',
              value: money(invoice.total),
              testId: 'invoice-total',
            },
            ...(isZeroMoney(invoice.depositPaid)
              ? []
              : [
                  {
                    label: 'Deposit paid',
                    value: `−${money(invoice.depositPaid)}`,
                    testId: 'invoice-deposit',
                  },
                ]),
            {
              label: paid ? 'Balance, paid' : 'Balance due',
              value: money(invoice.balance),
              total: true,
              testId: 'invoice-balance',
            },
          ]}
        />
        <p className="qp-xs qp-dimmed">
          The project total includes the options you chose and any changes you accepted along the
          way.
        </p>
        <PaymentPanel view={view} token={token} purpose="balance" {...payment} />
      </div>
    </Section>
  );
}
