import { composeMail, type MailContent } from '../mail/mail-content';
import { formatMoney, toDecimal } from '@pondwright/shared/pricing';

export function money(amount: string, currency: string): string {
  return new Intl.NumberFormat('en-US', { style: 'currency', currency }).format(
    Number(formatMoney(toDecimal(amount))),
  );
}

const FOOTER =
  'Sent with Pondwright on behalf of your contractor. Reply to this e-mail to reach them.';

export function quoteSentMail(args: {
  companyName: string;
  customerName: string;
  estimateNumber: number;
  title: string;
  url: string;
  total: string;
  currency: string;
  expiresAt: Date;
  message: string | undefined;
}): MailContent {
  return composeMail(
    `Your quote from ${args.companyName}: ${args.title} (No. ${args.estimateNumber})`,
    [
      { kind: 'paragraph', text: `Hello ${args.customerName},` },
      ...(args.message ? [{ kind: 'paragraph' as const, text: args.message }] : []),
      {
        kind: 'paragraph',
        text: `Your quote for "${args.title}" is ready: ${money(args.total, args.currency)} before any options you choose. Open it to see the plan, pick options, and accept when you are ready. The PDF is attached for your records.`,
      },
      { kind: 'button', label: 'Open your quote', url: args.url },
      {
        kind: 'paragraph',
        text: `The link works until ${args.expiresAt.toISOString().slice(0, 10)}. It is personal to you: please do not forward it.`,
      },
    ],
    FOOTER,
  );
}

export function quoteAcceptedHomeownerMail(args: {
  companyName: string;
  fullName: string;
  title: string;
  total: string;
  deposit: string;
  currency: string;
  url: string;
}): MailContent {
  return composeMail(
    `You accepted your quote from ${args.companyName}`,
    [
      { kind: 'paragraph', text: `Thank you, ${args.fullName}.` },
      {
        kind: 'paragraph',
        text: `You accepted "${args.title}" for ${money(args.total, args.currency)}. A deposit of ${money(args.deposit, args.currency)} reserves your place in the schedule.`,
      },
      { kind: 'button', label: 'Pay the deposit', url: args.url },
    ],
    FOOTER,
  );
}

export function quoteAnsweredStaffMail(args: {
  answer: 'accepted' | 'declined';
  estimateNumber: number;
  title: string;
  customerName: string;
  detail: string;
  url: string;
}): MailContent {
  return composeMail(
    `Estimate ${args.estimateNumber} ${args.answer} by ${args.customerName}`,
    [
      { kind: 'paragraph', text: `${args.customerName} ${args.answer} "${args.title}".` },
      { kind: 'paragraph', text: args.detail },
      ...(args.url ? [{ kind: 'button' as const, label: 'Open the estimate', url: args.url }] : []),
    ],
    'Pondwright',
  );
}

export function depositReceiptMail(args: {
  audience: 'homeowner' | 'company';
  /** What was paid: the deposit on acceptance, or the balance of the final invoice. */
  purpose: 'deposit' | 'balance';
  companyName: string;
  customerName: string;
  estimateNumber: number;
  title: string;
  amount: string;
  currency: string;
  paidAt: Date;
  reference: string;
  /** The estimate in the app, for the company's copy (the homeowner's link token is never stored). */
  url?: string;
}): MailContent {
  const paid = money(args.amount, args.currency);
  const when = args.paidAt.toISOString().replace('T', ' ').slice(0, 16) + ' UTC';
  if (args.audience === 'homeowner') {
    return composeMail(
      `Receipt: ${args.purpose} of ${paid} to ${args.companyName}`,
      [
        {
          kind: 'paragraph',
          text: `Thank you, ${args.customerName}. We received your ${args.purpose === 'deposit' ? 'deposit' : 'final payment'}.`,
        },
        {
          kind: 'paragraph',
          text: `Amount: ${paid}\nFor: ${args.title} (quote No. ${args.estimateNumber})\nPaid: ${when}\nReference: ${args.reference}`,
        },
        {
          kind: 'paragraph',
          text: 'Keep this e-mail as your receipt. Your original quote link still shows the quote and its PDF.',
        },
      ],
      FOOTER,
    );
  }
  return composeMail(
    `${args.purpose === 'deposit' ? 'Deposit' : 'Balance'} received: ${paid} for estimate ${args.estimateNumber}`,
    [
      {
        kind: 'paragraph',
        text: `${args.customerName} paid the ${args.purpose} of ${paid} for "${args.title}" on ${when}. Reference: ${args.reference}.`,
      },
      ...(args.url ? [{ kind: 'button' as const, label: 'Open the estimate', url: args.url }] : []),
    ],
    'Pondwright',
  );
}
