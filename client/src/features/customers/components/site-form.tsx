import {
  Alert,
  Button,
  Checkbox,
  Grid,
  Group,
  Modal,
  NativeSelect,
  Stack,
  Textarea,
  TextInput,
} from '@mantine/core';
import { createSiteSchema, SITE_SOIL_TYPES, type SiteView } from '@pondwright/shared';
import { IconAlertTriangle } from '@tabler/icons-react';
import { NumberTextInput } from '@/components/number-text-input';
import { applyApiErrorToForm, useSchemaForm } from '@/lib/form';
import { notifySuccess } from '@/lib/notify';
import { useSaveSite } from '../api/save-site';

const SOIL_LABELS: Record<(typeof SITE_SOIL_TYPES)[number], string> = {
  'sand-gravel': 'Sand or gravel',
  loam: 'Loam',
  clay: 'Clay',
};
const SOIL_OPTIONS = [
  { value: '', label: 'Not recorded' },
  ...SITE_SOIL_TYPES.map((soil) => ({ value: soil, label: SOIL_LABELS[soil] })),
];
const YES_NO_OPTIONS = [
  { value: '', label: 'Unknown' },
  { value: 'yes', label: 'Yes' },
  { value: 'no', label: 'No' },
];

const yesNoValue = (value: boolean | null | undefined) =>
  value === true ? 'yes' : value === false ? 'no' : '';
const fromYesNo = (value: string) => (value === 'yes' ? true : value === 'no' ? false : null);

export const UTILITIES_CAUTION =
  'Request utility locates before digging. Private lines (lighting, irrigation, gas to a shed) are not marked by the public locate; follow local rules.';

type SiteFormProps = {
  customerId: string;
  /** The site being edited; a new site when null. */
  site: SiteView | null;
  opened: boolean;
  onClose: () => void;
};

function initialValues(site: SiteView | null) {
  return {
    label: site?.label ?? '',
    addressLine: site?.addressLine ?? '',
    city: site?.city ?? '',
    region: site?.region ?? '',
    postalCode: site?.postalCode ?? '',
    accessWidthIn: site?.accessWidthIn ?? null,
    carryDistanceFt: site?.carryDistanceFt ?? null,
    slopePct: site?.slopePct ?? null,
    soil: site?.soil ?? null,
    waterAvailable: site?.waterAvailable ?? null,
    powerAvailable: site?.powerAvailable ?? null,
    utilitiesLocated: site?.utilitiesLocated ?? false,
    notes: site?.notes ?? '',
  };
}

/** Adds or edits a site: where it is and what the crew will meet there. */
export function SiteForm({ customerId, site, opened, onClose }: SiteFormProps) {
  const form = useSchemaForm(createSiteSchema, initialValues(site));
  const saveSite = useSaveSite(customerId);

  const numberInput = (field: 'accessWidthIn' | 'carryDistanceFt' | 'slopePct', label: string) => {
    const props = form.getInputProps(field);
    return (
      <NumberTextInput
        label={label}
        error={props.error as string | undefined}
        value={(props.value as number | string | null) ?? undefined}
        onChange={(value) => form.setFieldValue(field, (value ?? null) as never)}
      />
    );
  };

  const submit = form.onSubmit((values) =>
    saveSite.mutate(
      { siteId: site?.id ?? null, input: values },
      {
        onSuccess: () => {
          notifySuccess(site ? 'Site saved' : 'Site added');
          onClose();
        },
        onError: (error) => applyApiErrorToForm(form, error, 'Could not save the site'),
      },
    ),
  );

  return (
    <Modal
      opened={opened}
      onClose={onClose}
      title={site ? 'Edit site' : 'New site'}
      size="lg"
      centered
    >
      <form onSubmit={submit} noValidate aria-label={site ? 'Edit site' : 'New site'}>
        <Stack gap="sm">
          <Grid gap="sm">
            <Grid.Col span={{ base: 12, sm: 8 }}>
              <TextInput label="Address" required {...form.getInputProps('addressLine')} />
            </Grid.Col>
            <Grid.Col span={{ base: 12, sm: 4 }}>
              <TextInput label="Label" placeholder="Back garden" {...form.getInputProps('label')} />
            </Grid.Col>
            <Grid.Col span={{ base: 12, sm: 5 }}>
              <TextInput label="Town" {...form.getInputProps('city')} />
            </Grid.Col>
            <Grid.Col span={{ base: 6, sm: 4 }}>
              <TextInput label="Region" {...form.getInputProps('region')} />
            </Grid.Col>
            <Grid.Col span={{ base: 6, sm: 3 }}>
              <TextInput label="Postal code" {...form.getInputProps('postalCode')} />
            </Grid.Col>
            <Grid.Col span={{ base: 12, sm: 4 }}>
              {numberInput('accessWidthIn', 'Access width (in)')}
            </Grid.Col>
            <Grid.Col span={{ base: 12, sm: 4 }}>
              {numberInput('carryDistanceFt', 'Carry distance (ft)')}
            </Grid.Col>
            <Grid.Col span={{ base: 12, sm: 4 }}>{numberInput('slopePct', 'Slope (%)')}</Grid.Col>
            <Grid.Col span={{ base: 12, sm: 4 }}>
              <NativeSelect
                label="Soil"
                data={SOIL_OPTIONS}
                value={form.values.soil ?? ''}
                error={form.errors.soil}
                onChange={(event) =>
                  form.setFieldValue(
                    'soil',
                    (event.currentTarget.value || null) as typeof form.values.soil,
                  )
                }
              />
            </Grid.Col>
            <Grid.Col span={{ base: 6, sm: 4 }}>
              <NativeSelect
                label="Water available"
                data={YES_NO_OPTIONS}
                value={yesNoValue(form.values.waterAvailable)}
                onChange={(event) =>
                  form.setFieldValue('waterAvailable', fromYesNo(event.currentTarget.value))
                }
              />
            </Grid.Col>
            <Grid.Col span={{ base: 6, sm: 4 }}>
              <NativeSelect
                label="Power available"
                data={YES_NO_OPTIONS}
                value={yesNoValue(form.values.powerAvailable)}
                onChange={(event) =>
                  form.setFieldValue('powerAvailable', fromYesNo(event.currentTarget.value))
                }
              />
            </Grid.Col>
          </Grid>
          <Checkbox
            label="Utilities located"
            {...form.getInputProps('utilitiesLocated', { type: 'checkbox' })}
          />
          <Alert color="yellow" variant="light" icon={<IconAlertTriangle size={16} />} p="xs">
            {UTILITIES_CAUTION}
          </Alert>
          <Textarea label="Access and site notes" rows={3} {...form.getInputProps('notes')} />
          <Group justify="flex-end" gap="sm">
            <Button variant="default" onClick={onClose}>
              Cancel
            </Button>
            <Button type="submit" loading={saveSite.isPending}>
              {site ? 'Save site' : 'Add site'}
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
