import type { Role } from '@pondwright/shared';
import { composeMail, type MailContent } from '../mail/mail-content';

const ROLE_NAMES: Record<Role, string> = {
  owner: 'an owner',
  estimator: 'an estimator',
  crew_lead: 'a crew lead',
};

export function inviteMail(args: {
  companyName: string;
  inviterName: string;
  role: Role;
  url: string;
  expiresAt: Date;
}): MailContent {
  return composeMail(
    `${args.inviterName} invited you to ${args.companyName} on Pondwright`,
    [
      {
        kind: 'paragraph',
        text: `${args.inviterName} invited you to join ${args.companyName} as ${ROLE_NAMES[args.role]}.`,
      },
      { kind: 'button', label: 'Accept the invitation', url: args.url },
      {
        kind: 'paragraph',
        text: `The invitation works once, until ${args.expiresAt.toISOString().replace('T', ' ').slice(0, 16)} UTC. If you did not expect it, ignore this e-mail.`,
      },
    ],
    'Pondwright',
  );
}
