import { Anchor } from '@mantine/core';
import { IconArrowLeft } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { RequireRole } from '@/features/auth/components/require-role';
import { useSignedInUser } from '@/features/auth/hooks/use-signed-in-user';
import { LearnedRates } from '@/features/price-book/components/learned-rates';
import { canAccess } from '@/lib/authorization';

function LearnedRatesPage() {
  const { role } = useSignedInUser();
  const canAdopt = canAccess(role, 'learnedRatesAdopt');
  return (
    <>
      <PageHeader
        title="Crew rates"
        description={
          canAdopt
            ? 'How fast the crews really work, from closed jobs, beside the price book’s rates. Put a learned rate in the book when enough jobs stand behind it.'
            : 'How fast the crews really work, from closed jobs, beside the price book’s rates. Only owners change the book.'
        }
      />
      <LearnedRates canAdopt={canAdopt} />
    </>
  );
}

export function LearnedRatesRoute() {
  return (
    <RequireRole area="learnedRates" areaName="the crew rates">
      <Anchor
        component={Link}
        to={paths.priceBook.getHref('rates')}
        size="sm"
        mb="sm"
        display="inline-flex"
        style={{ alignItems: 'center', gap: 4 }}
      >
        <IconArrowLeft size={14} /> Price book
      </Anchor>
      <LearnedRatesPage />
    </RequireRole>
  );
}
