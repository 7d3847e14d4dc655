import type { EntityManager, FindOneOptions } from 'typeorm';
import { AppError } from '../common/errors/app-error';
import { isUuid } from '../common/tenancy/tenant-repository';
import { Estimate } from './entities/estimate.entity';

/**
 * Locks the company's estimate row for the transaction, so writes to one estimate (saves, sends,
 * answers) run one at a time; another company's id, or no id at all, is a 404.
 */
export function lockEstimate(
  manager: EntityManager,
  id: string,
  companyId: string,
): Promise<Estimate> {
  return companyEstimate(manager, id, companyId, { mode: 'pessimistic_write' });
}

/** The company's estimate to read, outside any transaction; a 404 as for `lockEstimate`. */
export function findEstimate(
  manager: EntityManager,
  id: string,
  companyId: string,
): Promise<Estimate> {
  return companyEstimate(manager, id, companyId, undefined);
}

async function companyEstimate(
  manager: EntityManager,
  id: string,
  companyId: string,
  lock: FindOneOptions<Estimate>['lock'],
): Promise<Estimate> {
  const estimate = isUuid(id)
    ? await manager.findOne(Estimate, { where: { id, companyId }, lock })
    : null;
  if (!estimate) throw new AppError('NOT_FOUND', 'Estimate not found');
  return estimate;
}
