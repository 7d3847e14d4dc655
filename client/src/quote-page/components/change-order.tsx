import type { QuoteView } from '@pondwright/shared';
import { isCredit, type QuoteChangeOrder } from '../lib/change-order';
import { formatDay, formatMoney, formatQuantity } from '../lib/format';
import { ButtonLink } from '../ui/button';
import { FocusHeading } from './answer-panels';
import { MoneyRows, Section } from './section';

type ChangeOrderSectionProps = {
  view: QuoteView;
  change: QuoteChangeOrder;
  /** Where the accept and decline forms are, while the change waits for an answer. */
  answerHref?: string;
};

function lineQuantity(line: QuoteChangeOrder['lines'][number]): string {
  if (line.change === 'added') return `${formatQuantity(line.quantity)} ${line.unit}`;
  if (line.change === 'removed') return 'Taken off';
  return `${formatQuantity(line.fromQuantity ?? '')} → ${formatQuantity(line.toQuantity ?? '')} ${line.unit}`;
}

/**
 * What the contractor would like to change: why, the lines added and taken off with their prices,
 * what it adds (or credits, when work comes off), and the job before → after.
 */
export function ChangeOrderSection({ view, change, answerHref }: ChangeOrderSectionProps) {
  const money = (amount: string) => formatMoney(amount, view.currency);
  const reason = change.reason ? change.reason.trim() : '';
  const declined = change.state === 'declined';
  const credit = isCredit(change);
  const onlyAdds = change.lines.every((line) => line.change === 'added');
  return (
    <Section title="Change to your project">
      <div className="qp-stack">
        <div>
          <p className="qp-sm qp-strong qp-dimmed">Change {change.number}</p>
          <h3 className="qp-h4 qp-tight">{change.title}</h3>
        </div>
        {reason && (
          <div>
            <p className="qp-sm qp-strong">Why this change</p>
            <p className="qp-pre-line">{reason}</p>
          </div>
        )}
        {change.lines.length > 0 && (
          <div className="qp-table-wrap">
            <table className="qp-lines">
              <caption>
                {onlyAdds ? 'What the change adds' : 'What the change adds and takes off'}
              </caption>
              <thead>
                <tr>
                  <th scope="col">Item</th>
                  <th scope="col">Quantity</th>
                  <th scope="col">Price</th>
                </tr>
              </thead>
              <tbody>
                {change.lines.map((line, i) => (
                  <tr key={i}>
                    <td>{line.description}</td>
                    <td>{lineQuantity(line)}</td>
                    <td>{money(line.price)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
        <MoneyRows
          label={credit ? 'What the change credits' : 'What the change costs'}
          rows={[
            {
              label: 'Change before tax',
              value: money(change.priceBeforeTax),
              testId: 'change-before-tax',
            },
            { label: 'Tax', value: money(change.tax), testId: 'change-tax' },
            {
              label: credit ? 'Credit to you, tax included' : 'The change adds, tax included',
              value: money(change.total),
              total: true,
              testId: 'change-total',
            },
          ]}
        />
        <div className="qp-job-total">
          <p className="qp-sm">
            {declined
              ? 'Your project total, tax included (unchanged)'
              : 'Your project total, tax included'}
          </p>
          <p className="qp-lg qp-strong" data-testid="change-job-total">
            {declined ? (
              money(change.previousJobTotal)
            ) : (
              <>
                {money(change.previousJobTotal)} <span aria-hidden="true">→</span>
                <span className="qp-sr-only"> becomes </span> {money(change.newJobTotal)}
              </>
            )}
          </p>
        </div>
        {change.state === 'open' && (
          <>
            <p className="qp-sm qp-dimmed">
              Nothing changes until you accept. The project details below show the whole job with
              this change.
            </p>
            {answerHref && (
              <div>
                <ButtonLink href={answerHref}>Review and accept</ButtonLink>
              </div>
            )}
          </>
        )}
      </div>
    </Section>
  );
}

type ChangeAnsweredPanelProps = {
  view: QuoteView;
  change: QuoteChangeOrder;
  /** Answered just now on this page: the heading takes focus. */
  focus: boolean;
};

/** The homeowner's answer to the change: accepted (and when) or declined. */
export function ChangeAnsweredPanel({ view, change, focus }: ChangeAnsweredPanelProps) {
  const money = (amount: string) => formatMoney(amount, view.currency);
  const email = view.company.replyToEmail;
  if (change.state === 'accepted') {
    return (
      <section className="qp-card" data-tone="reed" aria-label="Change accepted">
        <div className="qp-stack" data-gap="xs">
          <FocusHeading focus={focus}>
            {change.acceptedAt
              ? `Change accepted on ${formatDay(change.acceptedAt)}`
              : 'Change accepted'}
          </FocusHeading>
          <p className="qp-sm">
            Thank you. {view.company.name} will go ahead with it. Your project total is now{' '}
            <strong>{money(change.newJobTotal)}</strong>, tax included;{' '}
            {isCredit(change)
              ? 'the credit comes off the balance you pay when the work is finished.'
              : 'the change is added to the balance you pay when the work is finished.'}
          </p>
        </div>
      </section>
    );
  }
  if (change.state === 'declined') {
    return (
      <section className="qp-card" data-tone="muted" aria-label="Change declined">
        <div className="qp-stack" data-gap="xs">
          <FocusHeading focus={focus}>Change declined</FocusHeading>
          <p className="qp-sm">
            Thank you for letting {view.company.name} know. Your project goes ahead as agreed before
            this change.
          </p>
          <p className="qp-sm">
            Changed your mind?{' '}
            {email ? (
              <>
                Write to <a href={`mailto:${email}`}>{email}</a> and they can send the change again.
              </>
            ) : (
              `Contact ${view.company.name} and they can send the change again.`
            )}
          </p>
        </div>
      </section>
    );
  }
  return null;
}
