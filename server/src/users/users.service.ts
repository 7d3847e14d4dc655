import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { TeamMember } from '@pondwright/shared';
import { DataSource, type EntityManager } from 'typeorm';
import { AppError } from '../common/errors/app-error';
import { TenantContext } from '../common/tenancy/tenant-context';
import { TenantRepositories, type TenantRepository } from '../common/tenancy/tenant-repository';
import { RefreshTokensService } from '../auth/refresh-tokens.service';
import type { UpdateUserDto } from './dto/update-user.dto';
import { User } from './entities/user.entity';

/** The owner's team screen: list members, change roles, deactivate and reactivate. */
@Injectable()
export class UsersService {
  private readonly users: TenantRepository<User>;

  constructor(
    repositories: TenantRepositories,
    private readonly tenant: TenantContext,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly refreshTokens: RefreshTokensService,
  ) {
    this.users = repositories.for(User);
  }

  async list(): Promise<TeamMember[]> {
    const users = await this.users.find({ order: { active: 'DESC', name: 'ASC' } });
    return users.map(toTeamMember);
  }

  async get(id: string): Promise<TeamMember> {
    return toTeamMember(await this.users.getById(id, 'Team member'));
  }

  /**
   * Changes a member's role or active state. A company always keeps at least one active owner: the
   * company's owner rows are locked while checking, so two owners demoting each other at once cannot
   * both succeed.
   */
  async update(id: string, change: UpdateUserDto): Promise<TeamMember> {
    const user = await this.users.getById(id, 'Team member');
    const losesOwner =
      user.role === 'owner' &&
      user.active &&
      ((change.role && change.role !== 'owner') || change.active === false);
    const updated = await this.dataSource.transaction(async (manager) => {
      if (losesOwner) await this.assertAnotherActiveOwner(manager, user.id);
      if (change.role) user.role = change.role;
      if (change.active !== undefined) user.active = change.active;
      const saved = await this.users.save(user, manager);
      if (change.active === false) await this.refreshTokens.revokeAllForUser(user.id, manager);
      return saved;
    });
    return toTeamMember(updated);
  }

  private async assertAnotherActiveOwner(
    manager: EntityManager,
    leavingUserId: string,
  ): Promise<void> {
    const owners = (await manager.query(
      `SELECT id FROM users WHERE company_id = $1 AND role = 'owner' AND active FOR UPDATE`,
      [this.tenant.companyId],
    )) as Array<{ id: string }>;
    if (!owners.some((owner) => owner.id !== leavingUserId)) {
      throw new AppError(
        'LAST_OWNER',
        'The company needs at least one active owner. Make someone else an owner first.',
      );
    }
  }
}

function toTeamMember(user: User): TeamMember {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    active: user.active,
    createdAt: user.createdAt.toISOString(),
  };
}
