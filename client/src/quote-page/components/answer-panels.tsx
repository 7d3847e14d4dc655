import { Anchor, List, Paper, Stack, Text, Title } from '@mantine/core';
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
    <Title order={2} fz="h3" ref={heading} tabIndex={-1}>
      {children}
    </Title>
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
    <Paper
      component="section"
      p="md"
      aria-label="Your acceptance"
      withBorder
      style={{ borderColor: 'var(--mantine-color-reed-4)' }}
    >
      <Stack gap="sm">
        <FocusHeading focus={focus}>
          {invoiced
            ? 'Your acceptance'
            : acceptance
              ? `Thank you, ${acceptance.fullName}`
              : 'Thank you'}
        </FocusHeading>
        {acceptance && (
          <Text fz="sm">
            You accepted this quote on {formatMoment(acceptance.acceptedAt)}, as{' '}
            <strong>{acceptance.fullName}</strong>.
          </Text>
        )}
        <div>
          <Text fz="sm" fw={600}>
            Options you chose
          </Text>
          {chosen.length ? (
            <List fz="sm" spacing={2}>
              {chosen.map((o) => (
                <List.Item key={o.id}>{o.label}</List.Item>
              ))}
            </List>
          ) : (
            <Text fz="sm" c="dimmed">
              None — the quote as it stands.
            </Text>
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
      </Stack>
    </Paper>
  );
}

/** The homeowner declined; how to get in touch if they change their mind. */
export function DeclinedPanel({ view, focus }: { view: QuoteView; focus: boolean }) {
  const email = view.company.replyToEmail;
  return (
    <Paper component="section" p="md" bg="stone.1" aria-label="You declined this quote">
      <Stack gap="xs">
        <FocusHeading focus={focus}>You declined this quote</FocusHeading>
        <Text fz="sm">
          {view.declinedAt ? `You declined it on ${formatDay(view.declinedAt)}. ` : ''}
          Thank you for letting {view.company.name} know.
        </Text>
        <Text fz="sm">
          Changed your mind?{' '}
          {email ? (
            <>
              Write to <Anchor href={`mailto:${email}`}>{email}</Anchor> and they can send you a new
              quote.
            </>
          ) : (
            `Contact ${view.company.name} and they can send you a new quote.`
          )}
        </Text>
      </Stack>
    </Paper>
  );
}
