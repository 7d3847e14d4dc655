import { quoteSelectionTotals, type QuoteView } from '@pondwright/shared';
import {
  amountRows,
  amountRowsHeight,
  ensureSpace,
  LEFT,
  paragraphs,
  sectionHeading,
  table,
  tableHeight,
  type AmountRow,
} from './pdf-layout';
import { formatDate, formatMoney, formatPercent, isNonZeroMoney } from './pdf-format';
import { COLORS, CONTENT_WIDTH, TYPE } from './pdf-theme';
import type { QuoteTypesetter } from './quote-typesetter';

/** The amounts sit in the right-hand part of the page, where the eye looks for sums. */
const AMOUNTS_WIDTH = 320;
const AMOUNTS_X = LEFT + CONTENT_WIDTH - AMOUNTS_WIDTH;
/** A table shorter than this is kept on one page; the heading and intro line above it take about this, pt. */
const KEEP_TOGETHER_MAX_HEIGHT = 360;
const HEADING_AND_INTRO_HEIGHT = 80;

/**
 * The money part of the quote: the base price, the options, the total (with the homeowner's choices
 * once accepted) and the payment schedule.
 */
export function drawQuotePrices(t: QuoteTypesetter, quote: QuoteView): void {
  const money = (amount: string) => formatMoney(amount, quote.currency);
  const hasOptions = quote.options.length > 0;

  const baseRows: AmountRow[] = [
    { label: 'Price before tax', value: money(quote.base.priceBeforeTax) },
  ];
  if (isNonZeroMoney(quote.base.discount)) {
    // The price above already has the discount taken off; shown so the homeowner sees it was given.
    baseRows.push({
      label: 'Includes a discount of',
      value: money(quote.base.discount),
      kind: 'note',
    });
  }
  baseRows.push(
    { label: 'Sales tax', value: money(quote.base.tax) },
    {
      label: hasOptions ? 'Total without options' : 'Total',
      value: money(quote.base.total),
      kind: 'total',
    },
  );
  sectionHeading(t, 'Price', amountRowsHeight(baseRows));
  amountRows(t, baseRows, AMOUNTS_X, AMOUNTS_WIDTH);

  const chosenIds = quote.acceptance?.optionIds ?? [];
  if (hasOptions) drawOptions(t, quote, money);

  // The same calculation the quote page and the acceptance use; with no choices it is the base total.
  const totals = quoteSelectionTotals({
    baseTotal: quote.base.total,
    depositPct: quote.depositPct,
    options: quote.options,
    chosenIds,
  });
  if (quote.acceptance && hasOptions) {
    const acceptedRows: AmountRow[] = [
      { label: 'Total without options', value: money(quote.base.total) },
      { label: 'Options chosen, before tax', value: money(totals.optionsPrice) },
      { label: 'Sales tax on options', value: money(totals.optionsTax) },
      { label: 'Accepted total', value: money(totals.total), kind: 'total' },
    ];
    sectionHeading(t, 'Your total', amountRowsHeight(acceptedRows));
    amountRows(t, acceptedRows, AMOUNTS_X, AMOUNTS_WIDTH);
  }

  const scheduleRows: AmountRow[] = [
    {
      label: `Deposit on acceptance (${formatPercent(quote.depositPct)})`,
      value: money(totals.deposit),
    },
    { label: 'Balance on completion', value: money(totals.balance) },
  ];
  if (quote.payment?.status === 'paid') {
    scheduleRows.push({
      label: `Deposit received${quote.payment.paidAt ? ` ${formatDate(quote.payment.paidAt)}` : ''}`,
      value: money(quote.payment.amount),
      kind: 'note',
    });
  }
  sectionHeading(t, 'Payment schedule', amountRowsHeight(scheduleRows));
  amountRows(t, scheduleRows, AMOUNTS_X, AMOUNTS_WIDTH);
  if (!quote.acceptance && hasOptions) {
    t.doc.y += 4;
    t.style({ size: TYPE.small, color: COLORS.muted });
    t.write(
      'Shown for the price without options; options you choose are added to the total and the deposit.',
      AMOUNTS_X,
      t.doc.y,
      { width: AMOUNTS_WIDTH },
    );
  }
}

function drawOptions(
  t: QuoteTypesetter,
  quote: QuoteView,
  money: (amount: string) => string,
): void {
  const accepted = quote.acceptance;
  const kindLabel = { 'add-on': 'Add-on', alternate: 'Alternate' } as const;
  const widths = { chosen: accepted ? 64 : 0, kind: 70, price: 84, tax: 72 };
  const columns = [
    ...(accepted ? [{ header: 'Your choice', width: widths.chosen }] : []),
    {
      header: 'Option',
      width: CONTENT_WIDTH - widths.chosen - widths.kind - widths.price - widths.tax,
    },
    { header: 'Kind', width: widths.kind },
    { header: 'Price', width: widths.price, align: 'right' as const },
    { header: 'Tax', width: widths.tax, align: 'right' as const },
  ];
  const rows = quote.options.map((option) => {
    const chosen = accepted?.optionIds.includes(option.id) ?? false;
    return {
      cells: [
        ...(accepted ? [chosen ? 'Chosen' : '—'] : []),
        option.label,
        kindLabel[option.kind],
        money(option.price),
        money(option.tax),
      ],
      shaded: chosen,
      strong: chosen,
    };
  });
  // A short table starts on a new page with its heading rather than leave a row or two behind.
  const height = tableHeight(t, columns, rows);
  if (height < KEEP_TOGETHER_MAX_HEIGHT) ensureSpace(t.doc, height + HEADING_AND_INTRO_HEIGHT);
  sectionHeading(t, 'Options');
  paragraphs(t, [
    accepted
      ? 'The options you chose are marked. Prices are before tax; the tax each adds is shown beside it.'
      : 'You can add these when you accept. Prices are before tax; the tax each adds is shown beside it.',
  ]);
  table(t, columns, rows);
}
