import { Anchor, SimpleGrid, Text } from '@mantine/core';
import type { ProductionRates } from '@pondwright/shared/pricing';
import { Link } from 'react-router-dom';
import { NumberTextInput } from '@/components/number-text-input';
import { paths } from '@/config/paths';
import type { PriceBookDraft } from '../hooks/use-price-book-draft';
import { PRODUCTION_RATE_LABELS } from '@/lib/price-book-labels';

type ProductionRatesPanelProps = { draft: PriceBookDraft; readOnly: boolean };

/** How fast the crews work, which turns a takeoff's quantities into labor hours. */
export function ProductionRatesPanel({ draft, readOnly }: ProductionRatesPanelProps) {
  const rates = draft.draft.productionRates;
  const keys = Object.keys(PRODUCTION_RATE_LABELS) as Array<keyof ProductionRates>;
  return (
    <>
      <Text size="sm" c="dimmed" mb="md">
        Tune these from your own finished jobs; every takeoff turns quantities into hours with them.
        The{' '}
        <Anchor component={Link} to={paths.learnedRates.getHref()} inherit>
          crew rates from closed jobs
        </Anchor>{' '}
        show what the crews really achieved.
      </Text>
      <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="md">
        {keys.map((key) => (
          <NumberTextInput
            key={key}
            label={PRODUCTION_RATE_LABELS[key]}
            readOnly={readOnly}
            value={rates[key]}
            error={draft.errors[`productionRates.${key}`]}
            onChange={(value) =>
              draft.update('productionRates', { ...rates, [key]: value } as ProductionRates)
            }
          />
        ))}
      </SimpleGrid>
    </>
  );
}
