import { composeMail, type MailContent } from '../mail/mail-content';
import { money } from '../quotes/quote-mail';

export function invoiceMail(args: {
  companyName: string;
  customerName: string;
  title: string;
  number: number;
  total: string;
  depositPaid: string;
  balance: string;
  currency: string;
  url: string;
}): MailContent {
  return composeMail(
    `Your final invoice from ${args.companyName}: ${args.title} (No. ${args.number})`,
    [
      { kind: 'paragraph', text: `Hello ${args.customerName},` },
      {
        kind: 'paragraph',
        text: `Your water feature is finished. Thank you for having us!\n\nTotal: ${money(args.total, args.currency)}\nDeposit paid: ${money(args.depositPaid, args.currency)}\nBalance due: ${money(args.balance, args.currency)}`,
      },
      { kind: 'button', label: 'View and pay the balance', url: args.url },
    ],
    'Sent with Pondwright on behalf of your contractor. Reply to this e-mail to reach them.',
  );
}
