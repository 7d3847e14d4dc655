import type { ChangeOrderSummary } from '@pondwright/shared';
import { formatMoney, toDecimal } from '@pondwright/shared/pricing';
import { composeMail, type MailContent } from '../mail/mail-content';
import { money } from '../quotes/quote-mail';

export function changeOrderMail(args: {
  companyName: string;
  customerName: string;
  jobTitle: string;
  summary: ChangeOrderSummary;
  currency: string;
  url: string;
}): MailContent {
  const { summary } = args;
  const total = toDecimal(summary.total);
  const effect = total.isNegative()
    ? `This is a credit of ${money(formatMoney(total.negated()), args.currency)} (tax included), bringing the job to`
    : `This adds ${money(summary.total, args.currency)} (tax included), bringing the job to`;
  return composeMail(
    `Change order ${summary.number} for "${args.jobTitle}" from ${args.companyName}`,
    [
      { kind: 'paragraph', text: `Hello ${args.customerName},` },
      {
        kind: 'paragraph',
        text: `We would like to change the work: ${summary.title}.${summary.reason ? `\n\n${summary.reason}` : ''}\n\n${effect} ${money(summary.newJobTotal, args.currency)}. Nothing changes until you accept it.`,
      },
      { kind: 'button', label: 'Review the change', url: args.url },
    ],
    'Sent with Pondwright on behalf of your contractor. Reply to this e-mail to reach them.',
  );
}
