import {
  quoteTermsParagraphs,
  type EstimateComputed,
  type EstimateContent,
  type QuoteAcceptanceView,
  type QuoteInvoiceView,
  type QuotePaymentView,
  type QuoteView,
} from '@pondwright/shared';
import { crossSection, planDrawing } from '@pondwright/shared/drawings';
import { toDisplay, type QuantityKind, type UnitSystem } from '@pondwright/shared/engine';
import { formatMoney, PRICE_CATEGORIES, toDecimal } from '@pondwright/shared/pricing';
import { homeownerCautions } from './homeowner-cautions';

/** The words next to the consent checkbox; stored with each acceptance as what was agreed to. */
export const CONSENT_TEXT = 'I accept this quote, the options I chose and the terms above.';

export type QuoteViewSource = {
  companyName: string;
  hasLogo: boolean;
  replyToEmail: string | null;
  estimateNumber: number;
  customerName: string;
  siteAddress: string | null;
  version: {
    versionNumber: number;
    contentSha256: string;
    content: EstimateContent;
    computed: EstimateComputed;
  };
  link: { createdAt: Date; expiresAt: Date };
  /** The company’s terms the link was sent with (`termsOfLink`). */
  companyTerms: string;
  acceptance: QuoteAcceptanceView | null;
  payment: QuotePaymentView | null;
  declinedAt: Date | null;
  invoice: QuoteInvoiceView | null;
  changeOrder: QuoteView['changeOrder'];
};

/**
 * What the homeowner sees, built from the exact version the link was sent for: no costs, markups or
 * margins, only prices; the drawings computed here so the quote page needs no takeoff engine.
 */
export function buildQuoteView(source: QuoteViewSource): QuoteView {
  const { content, computed } = source.version;
  const priced = computed.priced;
  const totals = priced.totals;
  const system = content.input.unitSystem;
  const sections = content.input.basins
    .map((_, basinIndex) => crossSection(content.input, computed.takeoff, { basinIndex }))
    .filter((section) => section !== null);
  return {
    state: source.acceptance ? 'accepted' : source.declinedAt ? 'declined' : 'open',
    currency: priced.currency,
    company: {
      name: source.companyName,
      hasLogo: source.hasLogo,
      replyToEmail: source.replyToEmail,
    },
    estimate: {
      number: source.estimateNumber,
      title: content.title,
      customerName: source.customerName,
      siteAddress: source.siteAddress,
      versionNumber: source.version.versionNumber,
      contentSha256: source.version.contentSha256,
      issuedAt: source.link.createdAt.toISOString(),
      expiresAt: source.link.expiresAt.toISOString(),
    },
    scope: content.scope,
    highlights: highlights(content, computed, system),
    included: included(computed),
    drawings: {
      plan: content.input.basins.length > 0 ? planDrawing(content.input) : null,
      sections,
    },
    base: {
      priceBeforeTax: formatMoney(toDecimal(totals.total).minus(toDecimal(totals.tax))),
      discount: totals.discount,
      tax: totals.tax,
      total: totals.total,
    },
    options: priced.options.map((option) => ({
      id: option.id,
      label: option.label,
      kind: option.kind,
      price: option.price,
      tax: option.tax,
    })),
    depositPct: totals.depositPct,
    terms: quoteTermsShown({
      computed,
      expiresAt: source.link.expiresAt,
      companyTerms: source.companyTerms,
    }),
    cautions: homeownerCautions(computed.takeoff),
    acceptance: source.acceptance,
    payment: source.payment,
    declinedAt: source.declinedAt?.toISOString() ?? null,
    invoice: source.invoice,
    changeOrder: source.changeOrder,
  };
}

function shown(value: number, kind: QuantityKind, system: UnitSystem): string {
  const display = toDisplay(value, kind, system);
  return `${display.value.toLocaleString('en-US')} ${display.unit}`.trim();
}

function highlights(content: EstimateContent, computed: EstimateComputed, system: UnitSystem) {
  const takeoff = computed.takeoff;
  const rows: QuoteView['highlights'] = [];
  if (content.input.basins.length > 0) {
    const plan = planDrawing(content.input);
    plan.basins.forEach((basin) => {
      const label = plan.basins.length > 1 ? `Pond ${basin.index + 1}` : 'Pond size';
      rows.push({ label, value: `${basin.lengthLabel} × ${basin.widthLabel}` });
    });
    const deepestFt = Math.max(...takeoff.basins.map((basin) => basin.maxDepthFt));
    rows.push({ label: 'Deepest point', value: shown(deepestFt * 12, 'in', system) });
    rows.push({
      label: 'Water surface',
      value: shown(takeoff.water.surfaceAreaSqFt, 'sqFt', system),
    });
  }
  if (takeoff.water.volumeGallons > 0) {
    rows.push({ label: 'Water volume', value: shown(takeoff.water.volumeGallons, 'gal', system) });
  }
  if (takeoff.reservoir) {
    rows.push({
      label: 'Underground reservoir',
      value: shown(takeoff.reservoir.capacityGallons, 'gal', system),
    });
  }
  const streamFt = content.input.streams.reduce((sum, stream) => sum + stream.lengthFt, 0);
  if (streamFt > 0) rows.push({ label: 'Stream', value: shown(streamFt, 'ft', system) });
  const falls = content.input.waterfalls.length;
  if (falls > 0) rows.push({ label: 'Waterfalls', value: String(falls) });
  const best = takeoff.hydraulics?.best;
  if (best) {
    rows.push({
      label: 'Pump',
      value: `${shown(best.flowGph, 'gph', system)} at ${shown(best.headFt, 'headFt', system)}`,
    });
  }
  if (takeoff.lighting)
    rows.push({ label: 'Lighting', value: shown(takeoff.lighting.totalWatts, 'watt', system) });
  rows.push({ label: 'Crew time', value: shown(takeoff.labor.crewDays, 'day', system) });
  return rows;
}

/**
 * The base price's lines as plain words, by category. Labour is one line (its hours are in the crew
 * time above); the contingency is left out: it is an allowance inside the price, not something built,
 * and its description names the direct cost, which is the company's business, not the homeowner's.
 */
function included(computed: EstimateComputed): string[] {
  const lines = computed.priced.lines.filter(
    (line) => line.category !== 'labor' && line.source !== 'contingency',
  );
  const ordered = [...lines].sort(
    (a, b) => PRICE_CATEGORIES.indexOf(a.category) - PRICE_CATEGORIES.indexOf(b.category),
  );
  const items = ordered.map((line) => line.description);
  if (computed.priced.lines.some((line) => line.category === 'labor')) {
    items.push('Crew labour to dig, build, plant the stone and start the system');
  }
  return [...new Set(items)];
}

/**
 * The terms listed above the consent checkbox: first what the quote itself fixes (how long the prices
 * hold, the deposit, the sales tax), then the company's own terms, one item per paragraph.
 */
export function quoteTermsShown(args: {
  computed: EstimateComputed;
  expiresAt: Date;
  companyTerms: string;
}): string[] {
  const { depositPct, salesTaxPct } = args.computed.priced.totals;
  const until = args.expiresAt.toISOString().slice(0, 10);
  return [
    `Prices are good until ${until}. After that we may need to re-price materials.`,
    `A deposit of ${depositPct} % of the accepted total is due on acceptance to schedule the work; the balance is due on completion.`,
    `Sales tax at ${salesTaxPct} % is included where it applies.`,
    ...quoteTermsParagraphs(args.companyTerms),
  ];
}
