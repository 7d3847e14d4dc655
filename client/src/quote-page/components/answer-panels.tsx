import type { QuoteView } from '@pondwright/shared';
import { useEffect, useRef, type ReactNode } from 'react';
import { formatDay, formatMoment, formatMoney, formatPercent } from '../lib/format';
import { MoneyRows } from './section';
import type { ChosenTotals } from './totals';

/** A heading that takes focus when asked (after an answer made here), so it is read out first. */
export function FocusHeading({ children, focus }: { children: ReactNode; focus: boolean }) {
  const heading = useRef<HTMLHeadingElement>(null);
  useEffect(() => {
    if (!focus) return;
    heading.current?.focus();
    heading.current?.scrollIntoView({ block: 'start' });
  }, [focus]);
  return (
    <h2 className="qp-h3" ref={heading} tabIndex={-1}>
      {children}
    </h2>
  );
}

type AcceptedPanelProps = {
  view: QuoteView;
  totals: ChosenTotals;
  /** Accepted just now on this page: the heading takes focus. */
  focus: boolean;
  /** The deposit's part: pay, confirming or received (none on an invoice link). */
  payment?: ReactNode;
  /**
   * On the final invoice's link the invoice has the figures that count now (changes accepted since
   * included), so the acceptance only recalls the total agreed then.
   */
  invoiced?: boolean;
};

/** Who accepted and when, the options chosen and the totals, then the deposit. */
export function AcceptedPanel({ view, totals, focus, payment, invoiced }: AcceptedPanelProps) {
  const acceptance = view.acceptance;
  const money = (amount: string) => formatMoney(amount, view.currency);
  const chosen = view.options.filter((o) => acceptance?.optionIds.includes(o.id));
  return (
    <section className="qp-card" data-tone="reed" aria-label="Your acceptance">
      <div className="qp-stack" data-gap="sm">
        <FocusHeading focus={focus}>
          {invoiced
            ? 'Your acceptance'
            : acceptance
              ? `Thank you, ${acceptance.fullName}`
              : 'Thank you'}
        </FocusHeading>
        {acceptance && (
          <p className="qp-sm">
            You accepted this quote on {formatMoment(acceptance.acceptedAt)}, as{' '}
            <strong>{acceptance.fullName}</strong>.
          </p>
        )}
        <div>
          <p className="qp-sm qp-strong">Options you chose</p>
          {chosen.length ? (
            <ul className="qp-list qp-sm" data-spacing="tight">
              {chosen.map((o) => (
                <li key={o.id}>{o.label}</li>
              ))}
            </ul>
          ) : (
            <p className="qp-sm qp-dimmed">None — the quote as it stands.</p>
          )}
        </div>
        {invoiced ? (
          <MoneyRows
            label="Your total when you accepted"
            rows={[
              {
                label: 'Total when you accepted, tax included',
                value: money(totals.total),
                total: true,
              },
            ]}
          />
        ) : (
          <MoneyRows
            label="Your totals"
            rows={[
              {
                label: `Deposit (${formatPercent(view.depositPct)})${view.payment?.status === 'paid' ? ', paid' : ''}`,
                value: money(totals.deposit),
              },
              { label: 'Balance, on completion', value: money(totals.balance) },
              { label: 'Total, tax included', value: money(totals.total), total: true },
            ]}
          />
        )}
        {payment}
      </div>
    </section>
  );
}

/** The homeowner declined; how to get in touch if they change their mind. */
export function DeclinedPanel({ view, focus }: { view: QuoteView; focus: boolean }) {
  const email = view.company.replyToEmail;
  return (
    <section className="qp-card" data-tone="muted" aria-label="You declined this quote">
      <div className="qp-stack" data-gap="xs">
        <FocusHeading focus={focus}>You declined this quote</FocusHeading>
        <p className="qp-sm">
          {view.declinedAt ? `You declined it on ${formatDay(view.declinedAt)}. ` : ''}
          Thank you for letting {view.company.name} know.
        </p>
        <p className="qp-sm">
          Changed your mind?{' '}
          {email ? (
            <>
              Write to <a href={`mailto:${email}`}>{email}</a> and they can send you a new quote.
            </>
          ) : (
            `Contact ${view.company.name} and they can send you a new quote.`
          )}
        </p>
      </div>
    </section>
  );
}
