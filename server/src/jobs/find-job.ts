import type { EntityManager } from 'typeorm';
import { AppError } from '../common/errors/app-error';
import { isUuid } from '../common/tenancy/tenant-repository';
import { Job } from './entities/job.entity';

/**
 * The company's job, optionally locked for the transaction (changes to one job run one at a time);
 * another company's id, or no id at all, is a 404.
 */
export async function findCompanyJob(
  manager: EntityManager,
  id: string,
  companyId: string,
  lock = false,
): Promise<Job> {
  const job = isUuid(id)
    ? await manager.findOne(Job, {
        where: { id, companyId },
        ...(lock ? { lock: { mode: 'pessimistic_write' as const } } : {}),
      })
    : null;
  if (!job) throw new AppError('NOT_FOUND', 'Job not found');
  return job;
}
