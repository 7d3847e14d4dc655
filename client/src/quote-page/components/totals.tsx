import type { QuoteView } from '@pondwright/shared';
import { formatMoney, formatPercent } from '../lib/format';
import { ButtonLink } from '../ui/button';
import { MoneyRows, Section } from './section';

/** What the homeowner pays with their choices: the total, the deposit and the balance. */
export type ChosenTotals = { total: string; deposit: string; balance: string };

/** The total with the options ticked, pinned to the foot of the screen until scrolled to. */
export function StickySummary({
  view,
  totals,
  acceptHref,
}: {
  view: QuoteView;
  totals: ChosenTotals;
  acceptHref: string;
}) {
  const money = (amount: string) => formatMoney(amount, view.currency);
  return (
    <aside className="qp-summary" aria-label="Your total">
      <div className="qp-summary-row">
        <div className="qp-summary-figures" role="status" aria-live="polite" aria-atomic="true">
          <p className="qp-xs qp-dimmed">Total with your options, tax included</p>
          <p className="qp-summary-total" data-testid="live-total">
            {money(totals.total)}
          </p>
          <p className="qp-sm">
            Deposit {formatPercent(view.depositPct)}:{' '}
            <span className="qp-strong" data-testid="live-deposit">
              {money(totals.deposit)}
            </span>
          </p>
        </div>
        <ButtonLink href={acceptHref} className="qp-summary-action">
          Review and accept
        </ButtonLink>
      </div>
    </aside>
  );
}

/** When the money is due: the deposit on acceptance, the balance on completion. */
export function PaymentScheduleSection({
  view,
  totals,
  depositPaid,
}: {
  view: QuoteView;
  totals: ChosenTotals;
  depositPaid?: boolean;
}) {
  const money = (amount: string) => formatMoney(amount, view.currency);
  return (
    <Section title="Payment schedule">
      <div className="qp-stack" data-gap="xs">
        <MoneyRows
          label="Payment schedule"
          rows={[
            {
              label: `Deposit (${formatPercent(view.depositPct)}), ${depositPaid ? 'paid' : 'when you accept'}`,
              value: money(totals.deposit),
              testId: 'schedule-deposit',
            },
            {
              label: 'Balance, on completion',
              value: money(totals.balance),
              testId: 'schedule-balance',
            },
            { label: 'Total', value: money(totals.total), total: true },
          ]}
        />
        {view.state === 'open' && (
          <p className="qp-sm qp-dimmed">
            After you accept, you can pay the deposit online on a secure payment page.
          </p>
        )}
      </div>
    </Section>
  );
}
