import { Injectable } from '@nestjs/common';
import {
  DataSource,
  type DeepPartial,
  type EntityManager,
  type EntityTarget,
  type FindManyOptions,
  type FindOptionsWhere,
  type Repository,
} from 'typeorm';
import { AppError } from '../errors/app-error';
import type { CompanyOwned } from './company-owned';
import { TenantContext } from './tenant-context';

/**
 * A repository that only ever sees the current company's rows: every read adds `companyId`, every write
 * stamps it. Another company's id is simply not found, so it answers 404 and never leaks that it exists.
 */
export class TenantRepository<T extends CompanyOwned> {
  constructor(
    private readonly repository: Repository<T>,
    private readonly tenant: TenantContext,
  ) {}

  private scope(where?: FindOptionsWhere<T> | FindOptionsWhere<T>[]): FindOptionsWhere<T>[] {
    const companyId = this.tenant.companyId;
    const clauses = where === undefined ? [{}] : Array.isArray(where) ? where : [where];
    return clauses.map((clause) => ({ ...clause, companyId }) as FindOptionsWhere<T>);
  }

  find(options: FindManyOptions<T> = {}): Promise<T[]> {
    return this.repository.find({
      ...options,
      where: this.scope(options.where as FindOptionsWhere<T>),
    });
  }

  count(where?: FindOptionsWhere<T>): Promise<number> {
    return this.repository.count({ where: this.scope(where) });
  }

  findOneBy(where: FindOptionsWhere<T>): Promise<T | null> {
    return this.repository.findOne({ where: this.scope(where) });
  }

  /** The row with this id in the current company, or a 404 naming what was looked for. */
  async getById(id: string, what: string): Promise<T> {
    const found = isUuid(id)
      ? await this.findOneBy({ id } as unknown as FindOptionsWhere<T>)
      : null;
    if (!found) throw new AppError('NOT_FOUND', `${what} not found`);
    return found;
  }

  create(data: DeepPartial<T>): T {
    return this.repository.create({ ...data, companyId: this.tenant.companyId } as DeepPartial<T>);
  }

  /** Saves a row of the current company; refuses a row stamped with another company. */
  save(entity: T, manager?: EntityManager): Promise<T> {
    if (entity.companyId !== this.tenant.companyId) {
      throw new Error('Refusing to save a row that belongs to another company');
    }
    return manager ? manager.save(entity) : this.repository.save(entity);
  }
}

/** Hands out tenant repositories for entities that carry a company id. */
@Injectable()
export class TenantRepositories {
  constructor(
    private readonly dataSource: DataSource,
    private readonly tenant: TenantContext,
  ) {}

  for<T extends CompanyOwned>(entity: EntityTarget<T>): TenantRepository<T> {
    return new TenantRepository(this.dataSource.getRepository(entity), this.tenant);
  }
}

const UUID_PATTERN = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export function isUuid(value: string): boolean {
  return UUID_PATTERN.test(value);
}
