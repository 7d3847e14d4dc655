import { SimpleGrid, Stack, TextInput } from '@mantine/core';
import type { LogForm } from './log-form-types';
import { TicketPhotoButton } from './ticket-photo-button';

/**
 * What the supplier's ticket says. The unit cost is typed from the ticket for the office's cost
 * report; the crew is never shown a price the office set.
 */
export function DeliveryFields(props: {
  form: LogForm;
  path: `entries.${number}`;
  ticketNumber: string;
}) {
  const { form, path, ticketNumber } = props;
  return (
    <Stack gap="xs">
      <SimpleGrid cols={{ base: 1, xs: 3 }} spacing="xs">
        <TextInput
          label="Unit cost on the ticket"
          size="md"
          inputMode="decimal"
          {...form.getInputProps(`${path}.unitCost`)}
        />
        <TextInput label="Supplier" size="md" {...form.getInputProps(`${path}.supplier`)} />
        <TextInput
          label="Ticket number"
          size="md"
          autoCapitalize="characters"
          {...form.getInputProps(`${path}.ticketNumber`)}
        />
      </SimpleGrid>
      <TicketPhotoButton ticketNumber={ticketNumber} />
    </Stack>
  );
}
