import { createHash } from 'node:crypto';
import type { QuoteAcceptanceView, QuoteView } from '@pondwright/shared';
import { crossSection, planDrawing } from '@pondwright/shared/drawings';
import { examplePondInput, type TakeoffInput } from '@pondwright/shared/engine';

/**
 * An invented demo quote for the PDF's tests and samples: a made-up company, homeowner and place.
 * The customer's name has a character outside Latin-1 ("ś") on purpose. Money is consistent: price
 * before tax 13,500.00 (after a 750.00 discount) + tax 1,093.50 = total 14,593.50.
 */

/** A 16 × 11 ft oval pond with two shelves, battered walls, a 12 ft stream and one waterfall. */
export const demoPondInput: TakeoffInput = examplePondInput({
  basins: [
    {
      outline: { shape: 'oval', lengthFt: 16, widthFt: 11 },
      maxDepthFt: 2.5,
      wallStyle: 'battered',
      shelves: [
        { widthIn: 12, depthIn: 10 },
        { widthIn: 12, depthIn: 20 },
      ],
    },
  ],
  streams: [{ lengthFt: 12, widthFt: 3.5, dropFt: 2 }],
  waterfalls: [{ weirWidthIn: 24, sheet: 'medium' }],
});

const section = crossSection(demoPondInput, null);

export const DEMO_OPTION_IDS = {
  lighting: 'opt-lighting',
  ionizer: 'opt-ionizer',
  riverStone: 'opt-river-stone',
  autoFill: 'opt-auto-fill',
} as const;

export function demoQuoteView(overrides: Partial<QuoteView> = {}): QuoteView {
  return {
    state: 'open',
    currency: 'USD',
    company: {
      name: 'Fernhollow Water Gardens',
      hasLogo: false,
      replyToEmail: 'quotes@fernhollow-demo.example',
    },
    estimate: {
      number: 1042,
      title: 'Wildlife pond with stream and waterfall',
      customerName: 'Zofia Wiśniewska-Thorne',
      siteAddress: '27 Kingfisher Rise, Larchmere Vale',
      versionNumber: 3,
      contentSha256: createHash('sha256').update('demo quote 1042 version 3').digest('hex'),
      issuedAt: '2026-03-04T15:30:00.000Z',
      expiresAt: '2026-04-03T15:30:00.000Z',
    },
    scope: [
      'We will build a naturally balanced wildlife pond in the lower lawn, about 16 ft by 11 ft, with two planting shelves and a deep zone of 2½ ft where fish can overwinter.',
      'A 12 ft stream runs from a small header pool by the patio and drops over a 24 in waterfall into the pond. The pump sits in a skimmer at the far end, out of sight.',
      'We line the pond with 45 mil EPDM over a protective underlayment, set boulders on the walls and shelves, and cover the floor with rounded gravel. We’ll plant the shelves with native marginals and leave the site raked and seeded.',
    ].join('\n\n'),
    highlights: [
      { label: 'Pond size', value: '16 ft × 11 ft' },
      { label: 'Water volume', value: '1,480 US gal' },
      { label: 'Deepest point', value: '2.5 ft' },
      { label: 'Shelves', value: '2, at 10 in and 20 in' },
      { label: 'Stream', value: '12 ft × 3.5 ft' },
      { label: 'Waterfall', value: '24 in weir' },
    ],
    included: [
      'Excavation, with the soil hauled away',
      '45 mil EPDM liner and underlayment',
      'Boulders, river rock and gravel',
      'Skimmer, biological filter and a 3,600 gph pump',
      'Stream and waterfall construction',
      'Native marginal plants for both shelves',
      'First fill, water treatment and a start-up visit',
    ],
    drawings: { plan: planDrawing(demoPondInput), sections: section ? [section] : [] },
    base: { priceBeforeTax: '13500.00', discount: '750.00', tax: '1093.50', total: '14593.50' },
    options: [
      {
        id: DEMO_OPTION_IDS.lighting,
        label: 'Underwater lighting, three warm-white fixtures',
        kind: 'add-on',
        price: '1240.00',
        tax: '100.44',
      },
      {
        id: DEMO_OPTION_IDS.ionizer,
        label: 'Ionizer for string-algae control',
        kind: 'add-on',
        price: '685.00',
        tax: '55.49',
      },
      {
        id: DEMO_OPTION_IDS.riverStone,
        label: 'River-stone edging instead of flagstone',
        kind: 'alternate',
        price: '920.00',
        tax: '74.52',
      },
      {
        id: DEMO_OPTION_IDS.autoFill,
        label: 'Automatic top-off valve',
        kind: 'add-on',
        price: '410.00',
        tax: '33.21',
      },
    ],
    depositPct: '30.00',
    terms: [
      'Work starts within three weeks of the deposit, weather permitting.',
      'Changes to the design after acceptance are priced as a change order.',
      'Plants are guaranteed for one growing season; the liner carries the maker’s 20-year warranty.',
    ],
    cautions: [
      'Ponds deeper than 18 in may need a fence or a cover under local rules; check before the pond is filled.',
      'Keep children and pets away from the open excavation.',
      'The pump and lights need a GFCI-protected outlet, installed by a licensed electrician.',
    ],
    acceptance: null,
    payment: null,
    declinedAt: null,
    invoice: null,
    changeOrder: null,
    ...overrides,
  };
}

/** The homeowner chose the lighting and the river-stone edging; totals as recorded on acceptance. */
export const demoAcceptance: QuoteAcceptanceView = {
  fullName: 'Zofia Wiśniewska-Thorne',
  acceptedAt: '2026-03-09T18:05:00.000Z',
  optionIds: [DEMO_OPTION_IDS.lighting, DEMO_OPTION_IDS.riverStone],
  total: '16928.46',
  deposit: '5078.54',
};

export function acceptedDemoQuoteView(overrides: Partial<QuoteView> = {}): QuoteView {
  return demoQuoteView({
    state: 'accepted',
    acceptance: demoAcceptance,
    payment: { status: 'paid', amount: '5078.54', paidAt: '2026-03-10T14:20:00.000Z' },
    ...overrides,
  });
}
