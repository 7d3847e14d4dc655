import { Badge, Button, Center, Group, Loader, Stack, Text, Textarea, Title } from '@mantine/core';
import {
  DEFAULT_QUOTE_TERMS,
  QUOTE_TERMS_MAX_LENGTH,
  updateQuoteTermsSchema,
  type CompanyQuoteTerms,
} from '@pondwright/shared';
import { IconDeviceFloppy, IconRestore } from '@tabler/icons-react';
import { ErrorPanel } from '@/components/error-panel';
import { applyApiErrorToForm, useSchemaForm } from '@/lib/form';
import { notifySuccess } from '@/lib/notify';
import { useQuoteTerms } from '../api/get-quote-terms';
import { useUpdateQuoteTerms } from '../api/update-quote-terms';

const count = (n: number) => n.toLocaleString('en-US');

function TermsEditor({ current }: { current: CompanyQuoteTerms }) {
  const form = useSchemaForm(updateQuoteTermsSchema, { terms: current.terms });
  const update = useUpdateQuoteTerms();
  const text = form.getValues().terms ?? '';
  const over = text.length > QUOTE_TERMS_MAX_LENGTH;

  const submit = form.onSubmit((values) =>
    update.mutate(values, {
      onSuccess: (saved) => {
        form.setValues({ terms: saved.terms });
        form.resetDirty({ terms: saved.terms });
        notifySuccess(
          'Quotes you send from now on list these terms. Quotes already sent keep theirs.',
          saved.isDefault ? 'Default terms restored' : 'Quote terms saved',
        );
      },
      onError: (error) => applyApiErrorToForm(form, error, 'Could not save the terms'),
    }),
  );

  return (
    <form onSubmit={submit} noValidate aria-label="Quote terms">
      <Stack gap="xs">
        <Textarea
          label="Terms"
          description="Plain text. Leave a blank line between paragraphs; each paragraph is one item on the quote."
          rows={12}
          resize="vertical"
          {...form.getInputProps('terms')}
          value={text}
        />
        <Group justify="space-between" gap="xs">
          {current.isDefault ? (
            <Badge variant="light" color="stone">
              Built-in default terms
            </Badge>
          ) : (
            <Badge variant="light" color="reed">
              Your own terms
            </Badge>
          )}
          <Text size="xs" c={over ? 'red' : 'dimmed'} id="quote-terms-count">
            {count(text.length)} / {count(QUOTE_TERMS_MAX_LENGTH)} characters
          </Text>
        </Group>
        <Group gap="sm" mt="xs">
          <Button
            type="submit"
            loading={update.isPending}
            leftSection={<IconDeviceFloppy size={16} />}
          >
            Save terms
          </Button>
          <Button
            variant="subtle"
            leftSection={<IconRestore size={16} />}
            disabled={text === DEFAULT_QUOTE_TERMS}
            onClick={() => form.setFieldValue('terms', DEFAULT_QUOTE_TERMS)}
          >
            Restore the default terms
          </Button>
        </Group>
      </Stack>
    </form>
  );
}

/**
 * The owner's quote terms (payment, warranty, buried rock and utilities, permits, cancellation), listed
 * on each quote after the price validity, deposit and sales tax that come from the quote itself. A
 * quote keeps the terms it was sent with.
 */
export function QuoteTermsForm() {
  const terms = useQuoteTerms();
  return (
    <Stack gap="md" component="section" aria-labelledby="quote-terms-title">
      <div>
        <Title order={2} fz="h4" id="quote-terms-title">
          Quote terms
        </Title>
        <Text size="sm" c="dimmed">
          Listed under “Terms” on the quotes you send, after the price validity date, the deposit
          and the sales tax, which come from each quote. A quote keeps the terms it was sent with;
          the safety notes are always shown apart.
        </Text>
      </div>
      {terms.isPending ? (
        <Center h={120}>
          <Loader size="sm" aria-label="Loading the terms" />
        </Center>
      ) : terms.isError ? (
        <ErrorPanel
          title="Could not load the terms"
          error={terms.error}
          onRetry={() => void terms.refetch()}
        />
      ) : (
        <TermsEditor current={terms.data} />
      )}
    </Stack>
  );
}
