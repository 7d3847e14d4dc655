import type { EstimateContent, EstimateStatus } from '@pondwright/shared';
import { examplePondInput } from '@pondwright/shared/engine';
import { DEFAULT_QUOTE_TERMS, quoteSelectionTotals } from '@pondwright/shared';
import { createHash, randomBytes } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { Customer } from '../customers/entities/customer.entity';
import { EstimateDraft } from '../estimates/entities/estimate-draft.entity';
import { EstimateEvent } from '../estimates/entities/estimate-event.entity';
import { EstimateVersion } from '../estimates/entities/estimate-version.entity';
import { Estimate } from '../estimates/entities/estimate.entity';
import { versionSha256 } from '../estimates/content-hash';
import { priceEstimateContent } from '../estimates/price-estimate';
import { Payment } from '../payments/entities/payment.entity';
import { PriceBookVersion } from '../price-book/entities/price-book-version.entity';
import { QuoteAcceptance } from '../quotes/entities/quote-acceptance.entity';
import { QuoteLink } from '../quotes/entities/quote-link.entity';
import { CONSENT_TEXT, quoteTermsShown } from '../quotes/quote-view';
import { addDemoJob } from './seed-demo-job';

type DemoEstimate = {
  customer: string;
  title: string;
  status: Extract<EstimateStatus, 'draft' | 'approved' | 'accepted'>;
  scope: string;
  addOn: { id: string; description: string; unitCost: string } | null;
};

/** An invented spread of work in progress, so a new owner sees each stage of a quote. */
const DEMO_ESTIMATES: DemoEstimate[] = [
  {
    customer: 'Odile Brackenridge',
    title: 'Kitchen-view pond with waterfall',
    status: 'approved',
    scope:
      'A lined pond in view of the kitchen window, with two planting shelves, a skimmer and a waterfall filter box feeding a short stream.\n\nExcavated soil is hauled away; the lawn around the work is raked and seeded.',
    addOn: {
      id: 'uplights',
      description: 'Two underwater uplights on the waterfall',
      unitCost: '260.00',
    },
  },
  {
    customer: 'Maren Stillwater-Hobb',
    title: 'Terrace pond and stream',
    status: 'accepted',
    scope:
      'A pond below the terrace with a stream along the wall and a waterfall at its head. Boulders from the dig are reused where they fit.',
    addOn: { id: 'bench', description: 'Flagstone seat at the water’s edge', unitCost: '420.00' },
  },
  {
    customer: 'Corwin Ashgrove',
    title: 'Courtyard pond (first look)',
    status: 'draft',
    scope: '',
    addOn: null,
  },
];

/**
 * Demo estimates at three stages: a draft, an approved quote ready to send, and one the homeowner
 * accepted with its deposit paid. Added once, while the demo company has no estimates at all.
 */
export async function addDemoEstimates(
  manager: EntityManager,
  companyId: string,
  estimatorId: string,
): Promise<number> {
  if (await manager.existsBy(Estimate, { companyId })) return 0;
  const book = await manager.findOne(PriceBookVersion, {
    where: { companyId },
    order: { versionNumber: 'DESC' },
  });
  if (!book) return 0;
  let number = 0;
  for (const demo of DEMO_ESTIMATES) {
    const customer = await manager.findOneBy(Customer, { companyId, name: demo.customer });
    if (!customer) continue;
    number += 1;
    const { content, computed } = priceEstimateContent(
      {
        title: demo.title,
        customerId: customer.id,
        siteId: null,
        input: examplePondInput(),
        discountPct: '0',
        manualLines: demo.addOn
          ? [
              {
                id: demo.addOn.id,
                category: 'materials',
                description: demo.addOn.description,
                quantity: '1',
                unit: 'ea',
                unitCost: demo.addOn.unitCost,
                taxable: true,
                kind: 'add-on',
              },
            ]
          : [],
        scope: demo.scope,
        notes: '',
      },
      book.content,
    );
    const estimate = await manager.save(
      manager.create(Estimate, {
        companyId,
        number,
        title: demo.title,
        customerId: customer.id,
        siteId: null,
        status: demo.status,
        createdById: estimatorId,
      }),
    );
    await manager.insert(EstimateDraft, {
      estimateId: estimate.id,
      revision: 1,
      content,
      computed,
      priceBookVersionId: book.id,
      updatedById: estimatorId,
      updatedAt: new Date(),
    });
    await event(manager, companyId, estimate.id, estimatorId, 'created', { number });
    if (demo.status === 'draft') continue;
    const version = await manager.save(
      manager.create(EstimateVersion, {
        estimateId: estimate.id,
        versionNumber: 1,
        content,
        computed,
        contentSha256: versionSha256(content, computed),
        priceBookVersionId: book.id,
        finalisedById: estimatorId,
        finalisedAt: new Date(),
      }),
    );
    await event(manager, companyId, estimate.id, estimatorId, 'finalised', { versionNumber: 1 });
    if (demo.status === 'accepted') {
      const acceptance = await acceptWithPaidDeposit(
        manager,
        estimate,
        version,
        content,
        customer,
        estimatorId,
      );
      await addDemoJob(manager, { estimate, version, acceptance, estimatorId });
    }
  }
  return number;
}

/** The history of an accepted quote: a link (whose token nobody keeps), the acceptance and the deposit. */
async function acceptWithPaidDeposit(
  manager: EntityManager,
  estimate: Estimate,
  version: EstimateVersion,
  content: EstimateContent,
  customer: Customer,
  estimatorId: string,
): Promise<QuoteAcceptance> {
  const sentAt = new Date(Date.now() - 6 * 86_400_000);
  const link = await manager.save(
    manager.create(QuoteLink, {
      companyId: estimate.companyId,
      estimateId: estimate.id,
      versionId: version.id,
      tokenHash: createHash('sha256').update(randomBytes(32)).digest('hex'),
      recipientEmail: customer.email || 'homeowner@example.test',
      expiresAt: new Date(sentAt.getTime() + 30 * 86_400_000),
      revokedAt: null,
      firstViewedAt: new Date(sentAt.getTime() + 3_600_000),
      quoteTerms: DEFAULT_QUOTE_TERMS,
      createdById: estimatorId,
      createdAt: sentAt,
    }),
  );
  const priced = version.computed.priced;
  const chosen = priced.options.map((option) => option.id);
  const totals = quoteSelectionTotals({
    baseTotal: priced.totals.total,
    depositPct: priced.totals.depositPct,
    options: priced.options,
    chosenIds: chosen,
  });
  const acceptedAt = new Date(sentAt.getTime() + 2 * 86_400_000);
  const acceptance = await manager.save(
    manager.create(QuoteAcceptance, {
      companyId: estimate.companyId,
      estimateId: estimate.id,
      versionId: version.id,
      linkId: link.id,
      fullName: customer.name,
      consentText: CONSENT_TEXT,
      termsShown: quoteTermsShown({
        computed: version.computed,
        expiresAt: link.expiresAt,
        companyTerms: DEFAULT_QUOTE_TERMS,
      }),
      ip: '192.0.2.10',
      userAgent: 'Demo data',
      optionIds: totals.optionIds,
      contentSha256: version.contentSha256,
      total: totals.total,
      deposit: totals.deposit,
      acceptedAt,
    }),
  );
  await manager.insert(Payment, {
    companyId: estimate.companyId,
    estimateId: estimate.id,
    acceptanceId: acceptance.id,
    purpose: 'deposit',
    provider: 'demo',
    checkoutSessionId: `demo_${estimate.id}`,
    amount: totals.deposit,
    currency: priced.currency.toUpperCase(),
    status: 'paid',
    providerPaymentRef: `demo_${estimate.number}`,
    paidAt: new Date(acceptedAt.getTime() + 600_000),
  });
  await event(manager, estimate.companyId, estimate.id, estimatorId, 'quote-sent', {
    versionNumber: 1,
    recipientEmail: link.recipientEmail,
  });
  await event(manager, estimate.companyId, estimate.id, null, 'quote-accepted', {
    versionNumber: 1,
    fullName: customer.name,
    total: totals.total,
    deposit: totals.deposit,
    title: content.title,
  });
  await event(manager, estimate.companyId, estimate.id, null, 'deposit-paid', {
    amount: totals.deposit,
  });
  return acceptance;
}

async function event(
  manager: EntityManager,
  companyId: string,
  estimateId: string,
  actorId: string | null,
  action: string,
  detail: Record<string, unknown>,
): Promise<void> {
  await manager.save(
    manager.create(EstimateEvent, {
      companyId,
      estimateId,
      actorId,
      actorLabel: actorId ? null : action === 'deposit-paid' ? 'Payment provider' : 'Homeowner',
      action,
      detail,
    }),
  );
}
