import type { EntityManager } from 'typeorm';
import { AppError } from '../common/errors/app-error';
import { isUuid } from '../common/tenancy/tenant-repository';
import { Estimate } from './entities/estimate.entity';

/**
 * Locks the company's estimate row for the transaction, so writes to one estimate (saves, sends,
 * answers) run one at a time; another company's id, or no id at all, is a 404.
 */
export async function lockEstimate(
  manager: EntityManager,
  id: string,
  companyId: string,
): Promise<Estimate> {
  const estimate = isUuid(id)
    ? await manager.findOne(Estimate, {
        where: { id, companyId },
        lock: { mode: 'pessimistic_write' },
      })
    : null;
  if (!estimate) throw new AppError('NOT_FOUND', 'Estimate not found');
  return estimate;
}
