import type { EntityManager } from 'typeorm';
import { EstimateEvent } from '../estimates/entities/estimate-event.entity';

/** Who acted when no user did: shown in the estimate's timeline. */
export const HOMEOWNER = 'Homeowner';
export const PAYMENT_PROVIDER = 'Payment provider';

/** Appends a line to the estimate's audit log, in the caller's transaction. */
export async function recordEstimateEvent(
  manager: EntityManager,
  event: {
    companyId: string;
    estimateId: string;
    actorId?: string | null;
    actorLabel?: string | null;
    action: string;
    detail: Record<string, unknown>;
  },
): Promise<void> {
  await manager.save(
    manager.create(EstimateEvent, {
      companyId: event.companyId,
      estimateId: event.estimateId,
      actorId: event.actorId ?? null,
      actorLabel: event.actorLabel ?? null,
      action: event.action,
      detail: event.detail,
    }),
  );
}
