import {
  Alert,
  Button,
  Group,
  Paper,
  SimpleGrid,
  Stack,
  Table,
  Text,
  TextInput,
} from '@mantine/core';
import {
  marginPercentSchema,
  marginToMarkupPct,
  markupPercentSchema,
  markupToMarginPct,
  PRICE_CATEGORIES,
  pricingPolicySchema,
  type PriceCategory,
  type PricingPolicy,
} from '@pondwright/shared/pricing';
import { IconDeviceFloppy, IconInfoCircle } from '@tabler/icons-react';
import { useEffect, useState } from 'react';
import { ApiError } from '@/lib/api-error';
import { useSchemaForm } from '@/lib/form';
import { notifyApiError, notifySuccess } from '@/lib/notify';
import { useSavePricingPolicy } from '../api/save-pricing-policy';
import { CATEGORY_LABELS } from '@/lib/price-book-labels';

type PolicyFormProps = {
  policy: PricingPolicy;
  readOnly: boolean;
  /** Why saving must wait, e.g. unsaved table edits that a new version would leave behind. */
  blockedReason?: string;
  /** The page guards unsaved edits with one blocker for all its tabs; this form reports into it. */
  onDirtyChange?: (dirty: boolean) => void;
};

function marginsOf(policy: PricingPolicy): Record<PriceCategory, string> {
  return Object.fromEntries(
    PRICE_CATEGORIES.map((category) => [category, markupToMarginPct(policy.markupPct[category])]),
  ) as Record<PriceCategory, string>;
}

/**
 * Markup per category with the margin it gives beside it, either one editable: typing a
 * margin fills in the markup that yields it. Markup is on cost, margin is on price.
 */
export function PolicyForm({ policy, readOnly, blockedReason, onDirtyChange }: PolicyFormProps) {
  const form = useSchemaForm(pricingPolicySchema, policy);
  const [margins, setMargins] = useState(() => marginsOf(policy));
  const [marginErrors, setMarginErrors] = useState<Partial<Record<PriceCategory, string>>>({});
  const [note, setNote] = useState('');
  const save = useSavePricingPolicy();

  const changeMarkup = (category: PriceCategory, markup: string) => {
    form.setFieldValue(`markupPct.${category}`, markup);
    setMarginErrors((errors) => ({ ...errors, [category]: undefined }));
    if (markupPercentSchema.safeParse(markup).success) {
      setMargins((current) => ({ ...current, [category]: markupToMarginPct(markup) }));
    }
  };

  const changeMargin = (category: PriceCategory, margin: string) => {
    setMargins((current) => ({ ...current, [category]: margin }));
    const parsed = marginPercentSchema.safeParse(margin);
    setMarginErrors((errors) => ({
      ...errors,
      [category]: parsed.success ? undefined : parsed.error.issues[0]?.message,
    }));
    if (parsed.success) form.setFieldValue(`markupPct.${category}`, marginToMarkupPct(parsed.data));
  };

  const submit = form.onSubmit((values) =>
    save.mutate(
      { policy: values, note: note.trim() || undefined },
      {
        onSuccess: () => {
          form.resetDirty(values);
          setNote('');
          notifySuccess('The policy is saved as a new version of the price book.');
        },
        onError: (error) => {
          if (error instanceof ApiError) {
            form.setErrors(
              Object.fromEntries(
                error.details.map((detail) => [
                  detail.field.replace(/^(book\.)?policy\./, ''),
                  detail.message,
                ]),
              ),
            );
          }
          notifyApiError(error, 'Could not save the policy');
        },
      },
    ),
  );

  const values = form.getValues();
  const dirty = form.isDirty();
  useEffect(() => {
    onDirtyChange?.(dirty && !readOnly);
  }, [dirty, readOnly, onDirtyChange]);
  useEffect(() => () => onDirtyChange?.(false), [onDirtyChange]);

  return (
    <form onSubmit={submit} noValidate aria-label="Pricing policy">
      <Stack gap="lg" maw={720}>
        <Text size="sm" c="dimmed">
          Markup is added to cost; margin is the share of the price that is profit. A 25 % markup is
          a 20 % margin. Type either one.
        </Text>
        <Paper p="sm">
          <Table aria-label="Markup and margin by category">
            <Table.Thead>
              <Table.Tr>
                <Table.Th>Category</Table.Th>
                <Table.Th>Markup on cost %</Table.Th>
                <Table.Th>Margin on price %</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {PRICE_CATEGORIES.map((category) => (
                <Table.Tr key={category}>
                  <Table.Td fw={500}>{CATEGORY_LABELS[category]}</Table.Td>
                  <Table.Td>
                    <TextInput
                      size="xs"
                      inputMode="decimal"
                      aria-label={`${CATEGORY_LABELS[category]} markup %`}
                      readOnly={readOnly}
                      value={values.markupPct[category]}
                      error={form.errors[`markupPct.${category}`]}
                      onChange={(event) => changeMarkup(category, event.currentTarget.value)}
                    />
                  </Table.Td>
                  <Table.Td>
                    <TextInput
                      size="xs"
                      inputMode="decimal"
                      aria-label={`${CATEGORY_LABELS[category]} margin %`}
                      readOnly={readOnly}
                      value={margins[category]}
                      error={marginErrors[category]}
                      onChange={(event) => changeMargin(category, event.currentTarget.value)}
                    />
                  </Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        </Paper>
        <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="md">
          <TextInput
            label="Margin floor %"
            description="An estimate below this gross margin needs an owner's approval."
            inputMode="decimal"
            readOnly={readOnly}
            {...form.getInputProps('marginFloorPct')}
          />
          <TextInput
            label="Discount ceiling %"
            description="A discount above this share of the price needs an owner's approval."
            inputMode="decimal"
            readOnly={readOnly}
            {...form.getInputProps('discountCeilingPct')}
          />
        </SimpleGrid>
        {!readOnly && (
          <>
            <TextInput
              label="Note"
              placeholder="Why the policy changed"
              maxLength={500}
              value={note}
              onChange={(event) => setNote(event.currentTarget.value)}
            />
            {blockedReason && (
              <Alert color="clay" variant="light" icon={<IconInfoCircle />}>
                {blockedReason}
              </Alert>
            )}
            <Group>
              <Button
                type="submit"
                leftSection={<IconDeviceFloppy size={16} />}
                loading={save.isPending}
                disabled={!dirty || Boolean(blockedReason)}
              >
                Save policy as new version
              </Button>
            </Group>
          </>
        )}
      </Stack>
    </form>
  );
}
