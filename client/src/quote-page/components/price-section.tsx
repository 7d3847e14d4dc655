import { Badge, Box, Checkbox, Group, Stack, Text, Title } from '@mantine/core';
import type { QuoteOption, QuoteView } from '@pondwright/shared';
import { useId } from 'react';
import { formatAddedMoney, formatMoney, isZeroMoney } from '../lib/format';
import { MoneyRows, Section } from './section';

const KIND_LABELS: Record<QuoteOption['kind'], string> = {
  'add-on': 'Add-on',
  alternate: 'Alternate',
};

/** The base price: before tax, any discount already taken off, tax and the total. */
function BasePrice({ view }: { view: QuoteView }) {
  const money = (amount: string) => formatMoney(amount, view.currency);
  return (
    <MoneyRows
      label="Quoted price"
      rows={[
        { label: 'Price before tax', value: money(view.base.priceBeforeTax) },
        ...(isZeroMoney(view.base.discount)
          ? []
          : [{ label: 'Discount (already taken off)', value: `−${money(view.base.discount)}` }]),
        { label: 'Tax', value: money(view.base.tax) },
        { label: 'Quoted price with tax', value: money(view.base.total), total: true },
      ]}
    />
  );
}

function optionPrice(option: QuoteOption, currency: string): string {
  const price = formatAddedMoney(option.price, currency);
  return isZeroMoney(option.tax)
    ? `${price}, no tax`
    : `${price} plus ${formatMoney(option.tax, currency)} tax`;
}

function OptionLabel({ option, currency }: { option: QuoteOption; currency: string }) {
  return (
    <Box component="span" style={{ display: 'flex', flexDirection: 'column', gap: 2 }}>
      <Box
        component="span"
        style={{ display: 'flex', flexWrap: 'wrap', alignItems: 'center', gap: 6 }}
      >
        <Text component="span" fw={600}>
          {option.label}
        </Text>
        <Badge
          component="span"
          size="sm"
          variant="light"
          color={option.kind === 'add-on' ? 'reed' : 'clay'}
          fw={600}
        >
          {KIND_LABELS[option.kind]}
        </Badge>
      </Box>
      <Text component="span" fz="sm" c="stone.7">
        {optionPrice(option, currency)}
      </Text>
    </Box>
  );
}

type PriceSectionProps = {
  view: QuoteView;
  /** The options ticked; in read-only mode, the ones the homeowner chose (or none). */
  chosenIds: readonly string[];
  /** Given while the quote is open: the options become checkboxes. */
  onToggle?: (optionId: string, chosen: boolean) => void;
  /** The section's heading; "Your price" unless the link carries a change. */
  title?: string;
};

/** The base price and the options, as checkboxes while the quote is open. */
export function PriceSection({
  view,
  chosenIds,
  onToggle,
  title = 'Your price',
}: PriceSectionProps) {
  const accepted = view.state === 'accepted';
  const optionsHeading = useId();
  return (
    <Section title={title}>
      <Stack gap="md">
        <BasePrice view={view} />
        {view.options.length > 0 && (
          <Stack gap="xs" role="group" aria-labelledby={optionsHeading}>
            <Title order={3} fz="h5" id={optionsHeading}>
              Options
            </Title>
            <Text fz="sm" c="dimmed">
              {onToggle
                ? 'Tick any you’d like; the total updates as you go. An alternate replaces part of the standard work, and its price is the difference.'
                : 'An alternate replaces part of the standard work, and its price is the difference.'}
            </Text>
            {view.options.map((option) => {
              const chosen = chosenIds.includes(option.id);
              return onToggle ? (
                <div className="qp-option" key={option.id} data-checked={chosen || undefined}>
                  <Checkbox
                    checked={chosen}
                    onChange={(event) => onToggle(option.id, event.currentTarget.checked)}
                    label={<OptionLabel option={option} currency={view.currency} />}
                    styles={{ labelWrapper: { flex: 1 }, body: { alignItems: 'flex-start' } }}
                  />
                </div>
              ) : (
                <Group
                  key={option.id}
                  className="qp-option"
                  data-checked={(accepted && chosen) || undefined}
                  justify="space-between"
                  wrap="nowrap"
                  align="flex-start"
                >
                  <OptionLabel option={option} currency={view.currency} />
                  {accepted && (
                    <Text
                      fz="sm"
                      fw={600}
                      c={chosen ? 'reed.8' : 'dimmed'}
                      style={{ flexShrink: 0 }}
                    >
                      {chosen ? 'Chosen' : 'Not chosen'}
                    </Text>
                  )}
                </Group>
              );
            })}
          </Stack>
        )}
      </Stack>
    </Section>
  );
}
