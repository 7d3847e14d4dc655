import { Button, Group, Modal, Stack, Textarea, TextInput } from '@mantine/core';
import { createCustomerSchema, type CustomerDetail } from '@pondwright/shared';
import { applyApiErrorToForm, useSchemaForm } from '@/lib/form';
import { notifySuccess } from '@/lib/notify';
import { useCreateCustomer } from '../api/create-customer';

type CreateCustomerModalProps = {
  opened: boolean;
  onClose: () => void;
  onCreated: (customer: CustomerDetail) => void;
};

const EMPTY = { name: '', phone: '', email: '', notes: '' };

export function CreateCustomerModal({ opened, onClose, onCreated }: CreateCustomerModalProps) {
  const form = useSchemaForm(createCustomerSchema, EMPTY);
  const createCustomer = useCreateCustomer();

  const close = () => {
    form.reset();
    onClose();
  };

  const submit = form.onSubmit((values) =>
    createCustomer.mutate(values, {
      onSuccess: (customer) => {
        notifySuccess(`${customer.name} added`);
        form.reset();
        onCreated(customer);
      },
      onError: (error) => applyApiErrorToForm(form, error, 'Could not add the customer'),
    }),
  );

  return (
    <Modal opened={opened} onClose={close} title="New customer" centered>
      <form onSubmit={submit} noValidate aria-label="New customer">
        <Stack gap="sm">
          <TextInput label="Name" required data-autofocus {...form.getInputProps('name')} />
          <TextInput label="Phone" {...form.getInputProps('phone')} />
          <TextInput label="E-mail" type="email" {...form.getInputProps('email')} />
          <Textarea label="Notes" rows={3} {...form.getInputProps('notes')} />
          <Group justify="flex-end" gap="sm">
            <Button variant="default" onClick={close}>
              Cancel
            </Button>
            <Button type="submit" loading={createCustomer.isPending}>
              Add customer
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
