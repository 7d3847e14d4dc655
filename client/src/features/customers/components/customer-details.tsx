import { Button, Grid, Group, Paper, Textarea, TextInput, Title } from '@mantine/core';
import { createCustomerSchema, type CustomerDetail } from '@pondwright/shared';
import { IconTrash } from '@tabler/icons-react';
import { useState } from 'react';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { applyApiErrorToForm, useSchemaForm } from '@/lib/form';
import { notifySuccess } from '@/lib/notify';
import { useDeleteCustomer } from '../api/delete-customer';
import { useUpdateCustomer } from '../api/update-customer';

type CustomerDetailsProps = {
  customer: CustomerDetail;
  canEdit: boolean;
  onDeleted: () => void;
};

/** The customer's contact details, edited in place by those who may write. */
export function CustomerDetails({ customer, canEdit, onDeleted }: CustomerDetailsProps) {
  const form = useSchemaForm(createCustomerSchema, {
    name: customer.name,
    phone: customer.phone,
    email: customer.email,
    notes: customer.notes,
  });
  const updateCustomer = useUpdateCustomer(customer.id);
  const deleteCustomer = useDeleteCustomer(customer.id);
  const [confirming, setConfirming] = useState(false);

  const submit = form.onSubmit((values) =>
    updateCustomer.mutate(values, {
      onSuccess: (saved) => {
        form.setInitialValues({
          name: saved.name,
          phone: saved.phone,
          email: saved.email,
          notes: saved.notes,
        });
        form.reset();
        notifySuccess('Customer saved');
      },
      onError: (error) => applyApiErrorToForm(form, error, 'Could not save the customer'),
    }),
  );

  return (
    <Paper p="md">
      <form onSubmit={submit} noValidate aria-label="Customer details">
        <Title order={2} fz="h4" mb="sm">
          Details
        </Title>
        <Grid gap="sm">
          <Grid.Col span={{ base: 12, sm: 4 }}>
            <TextInput label="Name" required readOnly={!canEdit} {...form.getInputProps('name')} />
          </Grid.Col>
          <Grid.Col span={{ base: 12, sm: 4 }}>
            <TextInput label="Phone" readOnly={!canEdit} {...form.getInputProps('phone')} />
          </Grid.Col>
          <Grid.Col span={{ base: 12, sm: 4 }}>
            <TextInput
              label="E-mail"
              type="email"
              readOnly={!canEdit}
              {...form.getInputProps('email')}
            />
          </Grid.Col>
          <Grid.Col span={12}>
            <Textarea label="Notes" rows={3} readOnly={!canEdit} {...form.getInputProps('notes')} />
          </Grid.Col>
        </Grid>
        {canEdit && (
          <Group justify="space-between" mt="md">
            <Button
              variant="subtle"
              color="red"
              leftSection={<IconTrash size={16} />}
              onClick={() => setConfirming(true)}
            >
              Delete customer
            </Button>
            <Button type="submit" loading={updateCustomer.isPending} disabled={!form.isDirty()}>
              Save details
            </Button>
          </Group>
        )}
      </form>
      <ConfirmDialog
        opened={confirming}
        title="Delete this customer?"
        confirmLabel="Delete customer"
        confirmColor="red"
        loading={deleteCustomer.isPending}
        error={deleteCustomer.error}
        onCancel={() => setConfirming(false)}
        onConfirm={() =>
          deleteCustomer.mutate(undefined, {
            onSuccess: () => {
              notifySuccess(`${customer.name} deleted`);
              onDeleted();
            },
          })
        }
      >
        {customer.name} and {customer.sites.length === 1 ? 'their site' : 'all their sites'} will be
        removed. This cannot be undone.
      </ConfirmDialog>
    </Paper>
  );
}
