import { Anchor, Group } from '@mantine/core';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { RequireRole } from '@/features/auth/components/require-role';
import { useSignedInUser } from '@/features/auth/hooks/use-signed-in-user';
import { PriceBookWorkspace } from '@/features/price-book/components/price-book-workspace';
import { isPriceBookTab } from '@/features/price-book/utils/tabs';
import { canAccess } from '@/lib/authorization';

const PRICE_BOOK_ROOT = paths.priceBook.getHref();

function PriceBookPage() {
  const user = useSignedInUser();
  const { tab } = useParams();
  const navigate = useNavigate();
  const readOnly = !canAccess(user.role, 'priceBookEdit');
  return (
    <>
      <PageHeader
        title="Price book"
        description={
          readOnly
            ? 'What things cost the company and the margin it needs. Only owners change it.'
            : 'What things cost the company and the margin it needs. Every save is a new version, so past estimates keep the prices they were made with.'
        }
      />
      <Group mt={-8} mb="md">
        <Anchor component={Link} to={paths.learnedRates.getHref()} size="sm">
          Crew rates from closed jobs
        </Anchor>
      </Group>
      <PriceBookWorkspace
        tab={isPriceBookTab(tab) ? tab : 'materials'}
        onTabChange={(next) => navigate(paths.priceBook.getHref(next))}
        readOnly={readOnly}
        isWithinPage={(pathname) =>
          pathname === PRICE_BOOK_ROOT ||
          // The crew rates page sits under the book's path but is a page of its own: leaving for it
          // would drop unsaved edits, so the guard asks.
          (pathname.startsWith(`${PRICE_BOOK_ROOT}/`) && pathname !== paths.learnedRates.getHref())
        }
      />
    </>
  );
}

export function PriceBookRoute() {
  return (
    <RequireRole area="priceBook" areaName="the price book">
      <PriceBookPage />
    </RequireRole>
  );
}
