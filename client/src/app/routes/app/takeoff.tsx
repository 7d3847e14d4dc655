import { Alert } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import { TakeoffDrawings } from '@/components/drawings/takeoff-drawings';
import { PageHeader } from '@/components/page-header';
import { PageLoader } from '@/components/page-loader';
import { RequireRole } from '@/features/auth/components/require-role';
import { useCompany } from '@/features/company/api/get-company';
import { SavePricedTakeoffButton } from '@/features/priced-takeoffs/components/save-priced-takeoff-button';
import { TakeoffWorkspace } from '@/features/takeoff/components/takeoff-workspace';

/** The takeoff starts in the company's units; without them it starts in US units rather than not at all. */
function TakeoffPage() {
  const company = useCompany();
  if (company.isPending) return <PageLoader label="Opening the takeoff…" />;
  return (
    <>
      {company.isError && (
        <Alert color="yellow" variant="light" icon={<IconAlertTriangle />} mb="md">
          The company’s default units could not be loaded, so this takeoff starts in US units.
        </Alert>
      )}
      <TakeoffWorkspace
        unitSystem={company.data?.unitSystem ?? 'us'}
        renderActions={(input) => <SavePricedTakeoffButton input={input} />}
        renderDrawings={(input, takeoff) => <TakeoffDrawings input={input} takeoff={takeoff} />}
      />
    </>
  );
}

export function TakeoffRoute() {
  return (
    <RequireRole area="takeoff" areaName="takeoffs">
      <PageHeader
        title="Takeoff"
        description="Measure one water feature and get its volume, liner, dig, rock, pump, lighting and labor, with how each figure was computed."
      />
      <TakeoffPage />
    </RequireRole>
  );
}
