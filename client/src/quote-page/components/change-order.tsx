import { Anchor, Button, Paper, Stack, Text, Title } from '@mantine/core';
import type { QuoteView } from '@pondwright/shared';
import { formatDay, formatMoney, formatQuantity } from '../lib/format';
import { FocusHeading } from './answer-panels';
import { MoneyRows, Section } from './section';

/** The change order a link carries, with its own answer (the quote itself was accepted before). */
export type QuoteChangeOrder = NonNullable<QuoteView['changeOrder']>;

type ChangeOrderSectionProps = {
  view: QuoteView;
  change: QuoteChangeOrder;
  /** Where the accept and decline forms are, while the change waits for an answer. */
  answerHref?: string;
};

/** A change that takes off more than it adds: the homeowner's price goes down. */
export function isCredit(change: QuoteChangeOrder): boolean {
  // Only the sign is read; the figure itself comes from the server.
  return Number(change.total) < 0;
}

/** A credit's amount as the homeowner reads it, "1174.58" for a total of "-1174.58". */
export function creditAmount(change: QuoteChangeOrder): string {
  return change.total.replace(/^-/, '');
}

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
      <Stack gap="md">
        <div>
          <Text c="dimmed" fz="sm" fw={600}>
            Change {change.number}
          </Text>
          <Title order={3} fz="h4" lh={1.3}>
            {change.title}
          </Title>
        </div>
        {reason && (
          <div>
            <Text fz="sm" fw={600}>
              Why this change
            </Text>
            <Text style={{ whiteSpace: 'pre-line' }}>{reason}</Text>
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
          <Text fz="sm" c="stone.8">
            {declined
              ? 'Your project total, tax included (unchanged)'
              : 'Your project total, tax included'}
          </Text>
          <Text fz="lg" fw={600} data-testid="change-job-total">
            {declined ? (
              money(change.previousJobTotal)
            ) : (
              <>
                {money(change.previousJobTotal)} <span aria-hidden="true">→</span>
                <span className="qp-sr-only"> becomes </span> {money(change.newJobTotal)}
              </>
            )}
          </Text>
        </div>
        {change.state === 'open' && (
          <>
            <Text fz="sm" c="dimmed">
              Nothing changes until you accept. The project details below show the whole job with
              this change.
            </Text>
            {answerHref && (
              <div>
                <Button component="a" href={answerHref} size="sm">
                  Review and accept
                </Button>
              </div>
            )}
          </>
        )}
      </Stack>
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
      <Paper
        component="section"
        p="md"
        aria-label="Change accepted"
        withBorder
        style={{ borderColor: 'var(--mantine-color-reed-4)' }}
      >
        <Stack gap="xs">
          <FocusHeading focus={focus}>
            {change.acceptedAt
              ? `Change accepted on ${formatDay(change.acceptedAt)}`
              : 'Change accepted'}
          </FocusHeading>
          <Text fz="sm">
            Thank you. {view.company.name} will go ahead with it. Your project total is now{' '}
            <strong>{money(change.newJobTotal)}</strong>, tax included;{' '}
            {isCredit(change)
              ? 'the credit comes off the balance you pay when the work is finished.'
              : 'the change is added to the balance you pay when the work is finished.'}
          </Text>
        </Stack>
      </Paper>
    );
  }
  if (change.state === 'declined') {
    return (
      <Paper component="section" p="md" bg="stone.1" aria-label="Change declined">
        <Stack gap="xs">
          <FocusHeading focus={focus}>Change declined</FocusHeading>
          <Text fz="sm">
            Thank you for letting {view.company.name} know. Your project goes ahead as agreed before
            this change.
          </Text>
          <Text fz="sm">
            Changed your mind?{' '}
            {email ? (
              <>
                Write to <Anchor href={`mailto:${email}`}>{email}</Anchor> and they can send the
                change again.
              </>
            ) : (
              `Contact ${view.company.name} and they can send the change again.`
            )}
          </Text>
        </Stack>
      </Paper>
    );
  }
  return null;
}
