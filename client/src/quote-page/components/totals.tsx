import { Button, Group, Stack, Text } from '@mantine/core';
import type { QuoteView } from '@pondwright/shared';
import { formatMoney, formatPercent } from '../lib/format';
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
      <Group justify="space-between" wrap="nowrap" gap="sm" align="center">
        <div className="qp-summary-figures" role="status" aria-live="polite" aria-atomic="true">
          <Text fz="xs" c="dimmed" lh={1.3}>
            Total with your options, tax included
          </Text>
          <Text fz="xl" fw={600} lh={1.25} data-testid="live-total">
            {money(totals.total)}
          </Text>
          <Text fz="sm" lh={1.3}>
            Deposit {formatPercent(view.depositPct)}:{' '}
            <Text component="span" fw={600} fz="sm" data-testid="live-deposit">
              {money(totals.deposit)}
            </Text>
          </Text>
        </div>
        <Button component="a" href={acceptHref} size="sm" style={{ flexShrink: 0 }}>
          Review and accept
        </Button>
      </Group>
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
      <Stack gap="xs">
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
          <Text fz="sm" c="dimmed">
            After you accept, you can pay the deposit online on a secure payment page.
          </Text>
        )}
      </Stack>
    </Section>
  );
}
