import type { ReactNode } from 'react';
import { NotAllowed } from '@/components/not-allowed';
import { canAccess, type Area } from '@/lib/authorization';
import { useSignedInUser } from '../hooks/use-signed-in-user';

type RequireRoleProps = {
  area: Area;
  /** How to name the area to someone who may not open it, e.g. "team management". */
  areaName: string;
  children: ReactNode;
};

/** Keeps an area's page, and the requests it would make, away from roles it is not for. */
export function RequireRole({ area, areaName, children }: RequireRoleProps) {
  const user = useSignedInUser();
  if (!canAccess(user.role, area)) return <NotAllowed what={areaName} />;
  return children;
}
