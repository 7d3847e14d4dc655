import { z } from 'zod';
import { passwordSchema } from './password-policy';
import { roleSchema } from './roles';

export const emailSchema = z
  .string({ error: 'Enter an e-mail address' })
  .trim()
  .toLowerCase()
  .max(254, 'E-mail addresses are at most 254 characters')
  .pipe(z.email({ error: 'Enter a valid e-mail address' }));

export const personNameSchema = z
  .string({ error: 'Enter a name' })
  .trim()
  .min(1, 'Enter a name')
  .max(120, 'Use at most 120 characters');

export const companyNameSchema = z
  .string({ error: 'Enter the company name' })
  .trim()
  .min(2, 'Use at least 2 characters')
  .max(120, 'Use at most 120 characters');

export const signupSchema = z.object({
  companyName: companyNameSchema,
  name: personNameSchema,
  email: emailSchema,
  password: passwordSchema,
});
export type SignupInput = z.infer<typeof signupSchema>;

export const loginSchema = z.object({
  email: emailSchema,
  password: z.string({ error: 'Enter your password' }).min(1, 'Enter your password').max(1024),
});
export type LoginInput = z.infer<typeof loginSchema>;

/** Owners can invite estimators, crew leads and other owners. */
export const inviteSchema = z.object({
  email: emailSchema,
  role: roleSchema,
});
export type InviteInput = z.infer<typeof inviteSchema>;

export const acceptInviteSchema = z.object({
  token: z.string().min(1, 'The invite link is incomplete'),
  name: personNameSchema,
  password: passwordSchema,
});
export type AcceptInviteInput = z.infer<typeof acceptInviteSchema>;

export const changeRoleSchema = z.object({ role: roleSchema });
export type ChangeRoleInput = z.infer<typeof changeRoleSchema>;

export type AuthTokenResponse = { accessToken: string };

export type CurrentUser = {
  id: string;
  email: string;
  name: string;
  role: z.infer<typeof roleSchema>;
  companyId: string;
  companyName: string;
};

export type TeamMember = {
  id: string;
  email: string;
  name: string;
  role: z.infer<typeof roleSchema>;
  active: boolean;
  createdAt: string;
};

export type PendingInvite = {
  id: string;
  email: string;
  role: z.infer<typeof roleSchema>;
  expiresAt: string;
  createdAt: string;
  invitedByName: string;
};

/** What the owner gets back after inviting: the link to pass on until e-mail delivery exists. */
export type CreatedInvite = PendingInvite & { inviteUrl: string };

/** What an invitee sees before accepting. */
export type InvitePreview = {
  email: string;
  role: z.infer<typeof roleSchema>;
  companyName: string;
};

/** The single JSON error shape every API error takes. */
export type ApiErrorBody = {
  statusCode: number;
  error: string;
  message: string;
  details?: Array<{ field: string; message: string }>;
  /** The request's id, also in the `x-request-id` header and the server's log: what support asks for. */
  requestId?: string;
};
