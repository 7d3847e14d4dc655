import { Button, Group, Input, SegmentedControl, Stack, Text, TextInput } from '@mantine/core';
import { updateCompanySchema, type CompanyProfile } from '@pondwright/shared';
import { IconCircleCheck, IconDeviceFloppy } from '@tabler/icons-react';
import { useState } from 'react';
import { applyApiErrorToForm, useSchemaForm } from '@/lib/form';
import { notifySuccess } from '@/lib/notify';
import { useUpdateCompany } from '../api/update-company';

const UNIT_SYSTEMS = [
  { value: 'us', label: 'US customary (ft, gal)' },
  { value: 'metric', label: 'Metric (m, L)' },
];

type CompanyFormProps = {
  company: CompanyProfile;
  /** After the server has saved the change, e.g. to refresh the company name in the header. */
  onSaved?: (company: CompanyProfile) => void;
};

/** The owner's company settings: its name, and the units new takeoffs start in. */
export function CompanyForm({ company, onSaved }: CompanyFormProps) {
  const form = useSchemaForm(updateCompanySchema, {
    name: company.name,
    unitSystem: company.unitSystem,
  });
  const updateCompany = useUpdateCompany();
  const [saved, setSaved] = useState(false);

  const submit = form.onSubmit((values) =>
    updateCompany.mutate(values, {
      onSuccess: (updated) => {
        const current = { name: updated.name, unitSystem: updated.unitSystem };
        form.setValues(current);
        form.resetDirty(current);
        setSaved(true);
        notifySuccess('The company details are saved.');
        onSaved?.(updated);
      },
      onError: (error) => {
        setSaved(false);
        applyApiErrorToForm(form, error, 'Could not save the company');
      },
    }),
  );

  return (
    <form onSubmit={submit} noValidate aria-label="Company settings">
      <Stack gap="md">
        <TextInput
          label="Company name"
          description="Everyone on the team sees it beside their name."
          autoComplete="organization"
          required
          {...form.getInputProps('name')}
        />
        <Input.Wrapper
          id="company-unit-system"
          label="Default units"
          labelElement="div"
          description="New takeoffs start in these units; anyone can switch a takeoff while working on it."
          error={form.errors.unitSystem}
        >
          <SegmentedControl
            fullWidth
            mt={4}
            aria-labelledby="company-unit-system-label"
            data={UNIT_SYSTEMS}
            {...form.getInputProps('unitSystem')}
          />
        </Input.Wrapper>
        <Group gap="sm">
          <Button
            type="submit"
            loading={updateCompany.isPending}
            leftSection={<IconDeviceFloppy size={16} />}
          >
            Save
          </Button>
          {saved && !form.isDirty() && (
            <Group gap={4} c="reed.8" role="status">
              <IconCircleCheck size={16} />
              <Text size="sm">Saved</Text>
            </Group>
          )}
        </Group>
      </Stack>
    </form>
  );
}
