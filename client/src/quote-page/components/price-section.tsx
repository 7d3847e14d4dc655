import type { QuoteOption, QuoteView } from '@pondwright/shared';
import { useId } from 'react';
import { formatAddedMoney, formatMoney, isZeroMoney } from '../lib/format';
import { CheckboxField } from '../ui/checkbox-field';
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
    <span className="qp-option-label">
      <span className="qp-option-name">
        <span className="qp-strong">{option.label}</span>
        <span className="qp-badge" data-tone={option.kind === 'add-on' ? undefined : 'clay'}>
          {KIND_LABELS[option.kind]}
        </span>
      </span>
      <span className="qp-sm qp-dimmed">{optionPrice(option, currency)}</span>
    </span>
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
      <div className="qp-stack">
        <BasePrice view={view} />
        {view.options.length > 0 && (
          <div className="qp-stack" data-gap="xs" role="group" aria-labelledby={optionsHeading}>
            <h3 className="qp-h5" id={optionsHeading}>
              Options
            </h3>
            <p className="qp-sm qp-dimmed">
              {onToggle
                ? 'Tick any you’d like; the total updates as you go. An alternate replaces part of the standard work, and its price is the difference.'
                : 'An alternate replaces part of the standard work, and its price is the difference.'}
            </p>
            {view.options.map((option) => {
              const chosen = chosenIds.includes(option.id);
              return onToggle ? (
                <div
                  className="qp-option"
                  key={option.id}
                  data-checked={chosen || undefined}
                  data-control=""
                >
                  <CheckboxField
                    checked={chosen}
                    onChange={(event) => onToggle(option.id, event.currentTarget.checked)}
                    label={<OptionLabel option={option} currency={view.currency} />}
                  />
                </div>
              ) : (
                <div
                  key={option.id}
                  className="qp-option qp-option-read-only"
                  data-checked={(accepted && chosen) || undefined}
                >
                  <OptionLabel option={option} currency={view.currency} />
                  {accepted && (
                    <span
                      className="qp-sm qp-strong qp-option-verdict"
                      data-chosen={chosen || undefined}
                    >
                      {chosen ? 'Chosen' : 'Not chosen'}
                    </span>
                  )}
                </div>
              );
            })}
          </div>
        )}
      </div>
    </Section>
  );
}
