import { Paper, Stack } from '@mantine/core';
import { useQueryClient } from '@tanstack/react-query';
import { ErrorPanel } from '@/components/error-panel';
import { PageHeader } from '@/components/page-header';
import { PageLoader } from '@/components/page-loader';
import { currentUserQueryKey } from '@/features/auth/api/get-current-user';
import { RequireRole } from '@/features/auth/components/require-role';
import { useCompany } from '@/features/company/api/get-company';
import { CompanyForm } from '@/features/company/components/company-form';
import { CompanyLogo } from '@/features/company/components/company-logo';
import { QuoteTermsForm } from '@/features/company/components/quote-terms-form';

function CompanyPage() {
  const company = useCompany();
  const queryClient = useQueryClient();

  return (
    <>
      <PageHeader
        title="Company"
        description="Your company’s name and logo, the units new takeoffs start in, and the terms your quotes carry."
      />
      {company.isPending ? (
        <PageLoader label="Loading the company…" />
      ) : company.isError ? (
        <ErrorPanel
          title="Could not load the company"
          error={company.error}
          onRetry={() => void company.refetch()}
        />
      ) : (
        <Stack gap="lg" maw={560}>
          <Paper p="lg">
            <CompanyForm
              company={company.data}
              // The header shows the company name from the signed-in user.
              onSaved={() => queryClient.invalidateQueries({ queryKey: currentUserQueryKey })}
            />
          </Paper>
          <Paper p="lg">
            <CompanyLogo company={company.data} />
          </Paper>
          <Paper p="lg">
            <QuoteTermsForm />
          </Paper>
        </Stack>
      )}
    </>
  );
}

export function CompanyRoute() {
  return (
    <RequireRole area="company" areaName="company settings">
      <CompanyPage />
    </RequireRole>
  );
}
