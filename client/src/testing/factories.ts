import type {
  CompanyProfile,
  CreatedInvite,
  CurrentUser,
  PendingInvite,
  TeamMember,
} from '@pondwright/shared';

let sequence = 0;
const nextId = () => `00000000-0000-4000-8000-${String(++sequence).padStart(12, '0')}`;

export function buildCurrentUser(overrides: Partial<CurrentUser> = {}): CurrentUser {
  return {
    id: nextId(),
    email: 'owner@example.test',
    name: 'Olive Owner',
    role: 'owner',
    companyId: 'company-1',
    companyName: 'Example Ponds Co',
    ...overrides,
  };
}

export function buildMember(overrides: Partial<TeamMember> = {}): TeamMember {
  const id = overrides.id ?? nextId();
  return {
    id,
    email: `member-${id.slice(-4)}@example.test`,
    name: 'Esme Estimator',
    role: 'estimator',
    active: true,
    createdAt: '2026-01-15T10:00:00.000Z',
    ...overrides,
  };
}

export function buildInvite(overrides: Partial<PendingInvite> = {}): PendingInvite {
  return {
    id: nextId(),
    email: 'new.hire@example.test',
    role: 'crew_lead',
    expiresAt: '2099-03-01T10:00:00.000Z',
    createdAt: '2026-02-22T10:00:00.000Z',
    invitedByName: 'Olive Owner',
    ...overrides,
  };
}

export function buildCreatedInvite(overrides: Partial<CreatedInvite> = {}): CreatedInvite {
  return {
    ...buildInvite(overrides),
    inviteUrl: '/accept-invite/tok-123',
    ...overrides,
  };
}

export function buildCompany(overrides: Partial<CompanyProfile> = {}): CompanyProfile {
  return {
    id: 'company-1',
    name: 'Example Ponds Co',
    unitSystem: 'us',
    ...overrides,
  };
}
