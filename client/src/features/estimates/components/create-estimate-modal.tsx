import { Button, Group, Modal, Select, Stack, TextInput } from '@mantine/core';
import { useDebouncedValue } from '@mantine/hooks';
import { createEstimateRequestSchema, type EstimateView } from '@pondwright/shared';
import { useState } from 'react';
import { applyApiErrorToForm, useSchemaForm } from '@/lib/form';
import { useCreateEstimate } from '../api/create-estimate';
import { useCustomerSites } from '../api/get-customer-sites';
import { useCustomerSearch } from '../api/search-customers';

type CreateEstimateModalProps = {
  opened: boolean;
  onClose: () => void;
  onCreated: (estimate: EstimateView) => void;
};

function siteLabel(site: { label: string; addressLine: string; city: string }): string {
  const address = [site.addressLine, site.city].filter(Boolean).join(', ');
  return site.label ? `${site.label} — ${address}` : address || 'Unnamed site';
}

/** A title and a customer (found by searching the server), optionally one of the customer's sites. */
export function CreateEstimateModal({ opened, onClose, onCreated }: CreateEstimateModalProps) {
  const form = useSchemaForm(createEstimateRequestSchema, {
    title: '',
    customerId: '',
    siteId: null,
  });
  const [customerSearch, setCustomerSearch] = useState('');
  const [q] = useDebouncedValue(customerSearch, 250);
  const [customerName, setCustomerName] = useState<string | null>(null);
  const customers = useCustomerSearch(opened ? q : '');
  const customerId = form.getValues().customerId || null;
  const sites = useCustomerSites(opened ? customerId : null);
  const create = useCreateEstimate();

  const customerOptions = (customers.data?.items ?? []).map((customer) => ({
    value: customer.id,
    label: customer.name,
  }));
  // The chosen customer stays an option while the search shows others.
  if (customerId && customerName && !customerOptions.some((o) => o.value === customerId)) {
    customerOptions.unshift({ value: customerId, label: customerName });
  }

  const close = () => {
    form.reset();
    setCustomerSearch('');
    setCustomerName(null);
    create.reset();
    onClose();
  };

  const submit = form.onSubmit((values) => {
    create.mutate(values, {
      onSuccess: (created) => {
        close();
        onCreated(created);
      },
      onError: (error) => applyApiErrorToForm(form, error, 'Could not start the estimate'),
    });
  });

  return (
    <Modal opened={opened} onClose={close} title="New estimate" centered>
      <form onSubmit={submit} noValidate>
        <Stack gap="md">
          <TextInput
            label="Title"
            placeholder="Backyard koi pond"
            withAsterisk
            data-autofocus
            key={form.key('title')}
            {...form.getInputProps('title')}
          />
          <Select
            label="Customer"
            placeholder="Search by name, e-mail or phone"
            withAsterisk
            searchable
            filter={({ options }) => options}
            nothingFoundMessage={customers.isFetching ? 'Searching…' : 'No customers match'}
            data={customerOptions}
            searchValue={customerSearch}
            onSearchChange={setCustomerSearch}
            value={customerId}
            error={form.errors.customerId}
            onChange={(value, option) => {
              form.setFieldValue('customerId', value ?? '');
              form.setFieldValue('siteId', null);
              setCustomerName(option?.label ?? null);
            }}
          />
          <Select
            label="Site"
            description="Optional; the estimate can be priced before a site is chosen."
            placeholder={customerId ? 'Choose a site' : 'Choose a customer first'}
            disabled={!customerId}
            clearable
            data={(sites.data?.sites ?? []).map((site) => ({
              value: site.id,
              label: siteLabel(site),
            }))}
            value={form.getValues().siteId ?? null}
            error={form.errors.siteId}
            onChange={(value) => form.setFieldValue('siteId', value)}
          />
          <Group justify="flex-end" gap="sm">
            <Button variant="default" onClick={close}>
              Cancel
            </Button>
            <Button type="submit" loading={create.isPending}>
              Start the estimate
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
