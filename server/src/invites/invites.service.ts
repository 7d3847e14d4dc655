import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { CreatedInvite, InvitePreview, PendingInvite } from '@pondwright/shared';
import { DataSource, IsNull, MoreThan, type EntityManager } from 'typeorm';
import { AppConfig } from '../config/app-config';
import { AppError } from '../common/errors/app-error';
import { TenantRepositories, type TenantRepository } from '../common/tenancy/tenant-repository';
import { User } from '../users/entities/user.entity';
import { hashToken, newSecureToken } from '../auth/secure-token';
import { Company } from '../companies/entities/company.entity';
import { OutboxService } from '../mail/outbox.service';
import type { CreateInviteDto } from './dto/create-invite.dto';
import { inviteMail } from './invite-mail';
import { Invite } from './entities/invite.entity';
import { lookUpTogether } from '../database/look-up-together';

/** Single-use, expiring invitations. The token is shown once (in the link) and stored only hashed. */
@Injectable()
export class InvitesService {
  private readonly invites: TenantRepository<Invite>;

  constructor(
    repositories: TenantRepositories,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly config: AppConfig,
    private readonly outbox: OutboxService,
  ) {
    this.invites = repositories.for(Invite);
  }

  /** Invites still waiting: not accepted, not revoked, not expired. */
  async listPending(): Promise<PendingInvite[]> {
    const rows = await this.invites.find({
      where: { acceptedAt: IsNull(), revokedAt: IsNull(), expiresAt: MoreThan(new Date()) },
      relations: { invitedBy: true },
      order: { createdAt: 'DESC' },
    });
    return rows.map(toPendingInvite);
  }

  /** A fresh invite replaces any earlier pending one for the same e-mail. */
  async create(input: CreateInviteDto, invitedById: string): Promise<CreatedInvite> {
    if (await this.dataSource.manager.existsBy(User, { email: input.email })) {
      throw new AppError(
        'EMAIL_TAKEN',
        'Someone with this e-mail already has a Pondwright account.',
        [{ field: 'email', message: 'This e-mail already has an account' }],
      );
    }
    const token = newSecureToken();
    const invite = this.invites.create({
      email: input.email,
      role: input.role,
      tokenHash: hashToken(token),
      expiresAt: new Date(Date.now() + this.config.inviteTtlHours * 3600 * 1000),
      invitedById,
    });
    const inviteUrl = `${this.config.publicAppUrl}/accept-invite/${token}`;
    const saved = await this.dataSource.transaction(async (manager) => {
      await manager.update(
        Invite,
        {
          companyId: invite.companyId,
          email: input.email,
          acceptedAt: IsNull(),
          revokedAt: IsNull(),
        },
        { revokedAt: new Date() },
      );
      const stored = await this.invites.save(invite, manager);
      const [company, inviter] = await lookUpTogether(manager, [
        () => manager.findOneByOrFail(Company, { id: stored.companyId }),
        () => manager.findOneByOrFail(User, { id: invitedById }),
      ]);
      await this.outbox.enqueue(manager, {
        companyId: stored.companyId,
        kind: 'invite',
        to: input.email,
        replyTo: inviter.email,
        ...inviteMail({
          companyName: company.name,
          inviterName: inviter.name,
          role: input.role,
          url: inviteUrl,
          expiresAt: stored.expiresAt,
        }),
      });
      return stored;
    });
    const inviter = await this.dataSource.manager.findOneByOrFail(User, { id: invitedById });
    return { ...toPendingInvite({ ...saved, invitedBy: inviter }), inviteUrl };
  }

  async revoke(id: string): Promise<void> {
    const invite = await this.invites.getById(id, 'Invite');
    if (invite.acceptedAt || invite.revokedAt) return;
    invite.revokedAt = new Date();
    await this.invites.save(invite);
  }

  /** What the invitee sees before joining. */
  async preview(token: string): Promise<InvitePreview> {
    const invite = await this.findUsable(token, this.dataSource.manager, false);
    return { email: invite.email, role: invite.role, companyName: invite.company!.name };
  }

  /** Marks the invite used inside the caller's transaction and returns it; locked so it is used once. */
  consume(token: string, manager: EntityManager): Promise<Invite> {
    return this.findUsable(token, manager, true).then(async (invite) => {
      invite.acceptedAt = new Date();
      await manager.update(Invite, { id: invite.id }, { acceptedAt: invite.acceptedAt });
      return invite;
    });
  }

  private async findUsable(token: string, manager: EntityManager, lock: boolean): Promise<Invite> {
    const query = manager
      .createQueryBuilder(Invite, 'invite')
      .where('invite.tokenHash = :hash', { hash: hashToken(token) });
    if (lock) {
      query.setLock('pessimistic_write');
    } else {
      query.leftJoinAndSelect('invite.company', 'company');
    }
    const invite = await query.getOne();
    if (!invite)
      throw new AppError('INVITE_NOT_FOUND', 'This invite link is not valid. Ask for a new one.');
    if (invite.acceptedAt)
      throw new AppError('INVITE_EXPIRED', 'This invite has already been used. Sign in instead.');
    if (invite.revokedAt)
      throw new AppError('INVITE_EXPIRED', 'This invite was withdrawn. Ask for a new one.');
    if (invite.expiresAt.getTime() <= Date.now()) {
      throw new AppError('INVITE_EXPIRED', 'This invite has expired. Ask for a new one.');
    }
    return invite;
  }
}

function toPendingInvite(invite: Invite): PendingInvite {
  return {
    id: invite.id,
    email: invite.email,
    role: invite.role,
    expiresAt: invite.expiresAt.toISOString(),
    createdAt: invite.createdAt.toISOString(),
    invitedByName: invite.invitedBy?.name ?? '',
  };
}
