import { PageHeader } from '@/components/page-header';
import { RequireRole } from '@/features/auth/components/require-role';
import { TakeoffWorkspace } from '@/features/takeoff/components/takeoff-workspace';

export function TakeoffRoute() {
  return (
    <RequireRole area="takeoff" areaName="takeoffs">
      <PageHeader
        title="Takeoff"
        description="Measure one water feature and get its volume, liner, dig, rock, pump, lighting and labor, with how each figure was computed."
      />
      <TakeoffWorkspace />
    </RequireRole>
  );
}
