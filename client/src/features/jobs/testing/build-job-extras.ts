import type { ChangeOrderView, InvoiceView, PhotoView } from '@pondwright/shared';

const JOB_ID = '00000000-0000-4000-8000-0000000j0b01';

/** A priced change order of the job in `build-job.ts` (total before: $1,220.77). */
export function buildChangeOrder(overrides: Partial<ChangeOrderView> = {}): ChangeOrderView {
  return {
    id: '00000000-0000-4000-8000-00000000c001',
    jobId: JOB_ID,
    number: 1,
    title: 'Second waterfall',
    reason: 'The homeowner asked for a spillway by the patio',
    lines: [
      {
        change: 'added',
        description: 'Boulders',
        quantity: '2',
        unit: 'ton',
        fromQuantity: null,
        toQuantity: null,
        price: '255.00',
      },
    ],
    priceBeforeTax: '255.00',
    tax: '0.00',
    total: '255.00',
    previousJobTotal: '1220.77',
    newJobTotal: '1475.77',
    status: 'ready',
    versionNumber: 2,
    contentSha256: 'cd34',
    cost: '170.00',
    sentTo: null,
    acceptedByName: null,
    acceptedAt: null,
    declinedAt: null,
    createdAt: '2026-03-04T10:00:00.000Z',
    ...overrides,
  };
}

export function buildInvoice(overrides: Partial<InvoiceView> = {}): InvoiceView {
  return {
    id: '00000000-0000-4000-8000-0000000001v1',
    total: '1220.77',
    depositPaid: '366.23',
    balance: '854.54',
    status: 'open',
    issuedAt: '2026-03-09T15:00:00.000Z',
    paidAt: null,
    recipientEmail: 'bram@example.com',
    ...overrides,
  };
}

export function buildPhoto(overrides: Partial<PhotoView> = {}): PhotoView {
  const id = overrides.id ?? '00000000-0000-4000-8000-00000000f001';
  const path = `/api/jobs/${JOB_ID}/photos/${id}`;
  return {
    id,
    jobId: JOB_ID,
    logId: null,
    kind: 'before',
    caption: 'Lawn before digging',
    widthPx: 2048,
    heightPx: 1536,
    uploadedByName: 'Cal Crewlead',
    createdAt: '2026-03-03T08:00:00.000Z',
    imagePath: `${path}/image`,
    thumbnailPath: `${path}/thumbnail`,
    ...overrides,
  };
}
