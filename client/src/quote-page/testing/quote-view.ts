import type { QuoteView } from '@pondwright/shared';
import { crossSection, planDrawing } from '@pondwright/shared/drawings';
import { examplePondInput } from '@pondwright/shared/engine';

/** The token in the fixture's link, `/q/<token>`. */
export const QUOTE_TOKEN = 'qt_7hGm2pXc9RkLw4Vn';
export const QUOTE_PATH = `/q/${QUOTE_TOKEN}`;
export const CONTENT_SHA256 = 'a3f1c2d4e5b6978877665544332211ffeeddccbbaa99887766554433221100ab';

// The example pond (15 × 10 ft, one shelf, a waterfall and a short stream), drawn as the server would.
// Tests only: the quote page itself never imports the engine.
const pond = examplePondInput();
const plan = planDrawing(pond);
const section = crossSection(pond, null, { basinIndex: 0 });

/**
 * An open quote as `GET /api/quotes/:token` answers it. Figures chosen for checking by hand:
 * base total 12,412.50 (12,000.00 before tax, after a 500.00 discount, plus 412.50 tax), 30 % deposit.
 */
export function buildQuoteView(overrides: Partial<QuoteView> = {}): QuoteView {
  return {
    state: 'open',
    currency: 'USD',
    company: {
      name: 'Stillwater Ponds & Gardens',
      hasLogo: true,
      replyToEmail: 'hello@stillwater.example',
    },
    estimate: {
      number: 1042,
      title: 'Koi pond with waterfall and stream',
      customerName: 'Bram Thistlewood',
      siteAddress: '18 Alder Lane, Greenfield, OR 97123',
      versionNumber: 2,
      contentSha256: CONTENT_SHA256,
      issuedAt: '2027-04-06T15:00:00.000Z',
      expiresAt: '2027-05-06T15:00:00.000Z',
    },
    scope:
      'We will dig and shape a 15 × 10 ft pond, 2 ft at its deepest, with a planting shelf all round ' +
      'at 10 in.\n\nThe pond is lined with 45 mil EPDM over a protective underlayment, and the edges ' +
      'are finished with local stone and river gravel.\n\nA 9 ft stream runs down to a 24 in ' +
      'waterfall, fed by a quiet external pump.',
    highlights: [
      { label: 'Size', value: '15 ft × 10 ft' },
      { label: 'Water volume', value: '1,480 US gal' },
      { label: 'Deepest point', value: '2 ft' },
      { label: 'Planting shelf', value: '10 in deep' },
      { label: 'Stream', value: '9 ft long' },
      { label: 'Waterfall', value: '24 in wide' },
    ],
    included: [
      'Excavation and hauling away the soil',
      '45 mil EPDM liner and underlayment',
      'Boulders, stone edging and gravel',
      'Pump, filter, skimmer and plumbing',
      'Filling, start-up and a walk-through of the care routine',
    ],
    drawings: { plan, sections: section ? [section] : [] },
    base: { priceBeforeTax: '12000.00', discount: '500.00', tax: '412.50', total: '12412.50' },
    options: [
      {
        id: 'opt-lighting',
        label: 'Underwater LED lighting (3 lights)',
        kind: 'add-on',
        price: '850.00',
        tax: '29.75',
      },
      {
        id: 'opt-aerator',
        label: 'Winter aerator',
        kind: 'add-on',
        price: '325.00',
        tax: '11.38',
      },
      {
        id: 'opt-stone-spillway',
        label: 'Natural stone spillway instead of the spillway kit',
        kind: 'alternate',
        price: '1200.00',
        tax: '0.00',
      },
    ],
    depositPct: '30.00',
    terms: [
      'This quote is valid until the date above.',
      'A 30% deposit books the work; the balance is due on completion.',
      'Plants and fish are not included unless listed.',
    ],
    cautions: [
      'Pumps and lights near water need a GFCI-protected outlet, installed by a licensed electrician.',
      'Deep water is a drowning risk for young children: consider a fence or a safety grid.',
      'Before any digging we call the utility-locate service (811 in the US) to mark buried lines.',
    ],
    acceptance: null,
    payment: null,
    declinedAt: null,
    invoice: null,
    changeOrder: null,
    ...overrides,
  };
}

/** The same quote accepted with the lighting: 13,292.25 total, 3,987.68 deposit (see the tests). */
export function acceptedQuoteView(
  payment: QuoteView['payment'] = { status: 'pending', amount: '3987.68', paidAt: null },
): QuoteView {
  return buildQuoteView({
    state: 'accepted',
    acceptance: {
      fullName: 'Bram Thistlewood',
      acceptedAt: '2027-04-08T18:30:00.000Z',
      optionIds: ['opt-lighting'],
      total: '13292.25',
      deposit: '3987.68',
    },
    payment,
  });
}

export function paidQuoteView(): QuoteView {
  return acceptedQuoteView({
    status: 'paid',
    amount: '3987.68',
    paidAt: '2027-04-08T18:34:00.000Z',
  });
}

/** The version the change order was sent with (the estimate's next version). */
export const CHANGE_SHA256 = 'c0ffee00d15ea5e0b00b0a7f11e2d3c4b5a6978877665544332211ffeeddcc01';

/**
 * A change order on the job made from the accepted quote (lighting chosen, deposit paid). Figures:
 * the lines 1,450.00 + 330.00 = 1,780.00 before tax; tax at the quote's 3.4375 % = 61.1875 → 61.19;
 * the change adds 1,841.19, taking the job from 13,292.25 to 15,133.44. The rest of the view is the
 * whole job after the change: base 12,412.50 + 1,841.19 = 14,253.69 (13,780.00 before tax, the
 * 500.00 discount already taken off, plus 412.50 + 61.19 = 473.69 tax).
 */
export function changeOrderQuoteView(state: 'open' | 'accepted' | 'declined' = 'open'): QuoteView {
  const accepted = paidQuoteView();
  return {
    ...accepted,
    estimate: { ...accepted.estimate, versionNumber: 3, contentSha256: CHANGE_SHA256 },
    base: { priceBeforeTax: '13780.00', discount: '500.00', tax: '473.69', total: '14253.69' },
    changeOrder: {
      number: 2,
      title: 'Bog filter and a longer planting shelf',
      reason:
        'The ground on the east side stays damp, which suits a bog filter: the plants clean the ' +
        'water and the pump works less.',
      lines: [
        {
          change: 'added',
          description: 'Bog filter bed with gravel and plants',
          quantity: '1',
          unit: 'ea',
          fromQuantity: null,
          toQuantity: null,
          price: '1450.00',
        },
        {
          change: 'added',
          description: 'Planting shelf, extended',
          quantity: '6.000',
          unit: 'ft',
          fromQuantity: null,
          toQuantity: null,
          price: '330.00',
        },
      ],
      priceBeforeTax: '1780.00',
      tax: '61.19',
      total: '1841.19',
      previousJobTotal: '13292.25',
      newJobTotal: '15133.44',
      state,
      acceptedAt: state === 'accepted' ? '2027-06-03T17:20:00.000Z' : null,
    },
  };
}

/**
 * The final invoice's link, after the change was accepted: 15,133.44 total, less the 3,987.68 deposit
 * paid, leaves 11,145.76 to pay.
 */
export function invoiceQuoteView(
  status: 'open' | 'paid' = 'open',
  paidAt: string | null = status === 'paid' ? '2027-06-21T09:15:00.000Z' : null,
): QuoteView {
  return {
    ...paidQuoteView(),
    invoice: {
      issuedAt: '2027-06-20T16:00:00.000Z',
      total: '15133.44',
      depositPaid: '3987.68',
      balance: '11145.76',
      status,
      paidAt,
    },
  };
}
