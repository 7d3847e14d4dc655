import { NativeSelect, SimpleGrid, Stack, TextInput, Title } from '@mantine/core';
import type { JobSettings, MaterialKind, PriceBook } from '@pondwright/shared/pricing';
import type { PriceBookDraft } from '../hooks/use-price-book-draft';
import { TASK_LABELS } from '@/lib/price-book-labels';

type JobSettingsPanelProps = { draft: PriceBookDraft; readOnly: boolean };

type AmountKey = 'mobilizationCost' | 'minimumJobPrice';
type PercentKey = 'contingencyPct' | 'salesTaxPct' | 'depositPct';

const AMOUNTS: Array<{ key: AmountKey; label: string; description: string }> = [
  {
    key: 'mobilizationCost',
    label: 'Mobilization',
    description: 'Travel and set-up, charged once per job.',
  },
  { key: 'minimumJobPrice', label: 'Minimum job price', description: 'The least a job sells for.' },
];
const PERCENTS: Array<{ key: PercentKey; label: string; description: string }> = [
  {
    key: 'contingencyPct',
    label: 'Contingency %',
    description: 'Added to direct cost for the unknowns of digging.',
  },
  { key: 'salesTaxPct', label: 'Sales tax %', description: 'On taxable materials.' },
  { key: 'depositPct', label: 'Deposit %', description: 'The share of the total asked up front.' },
];

function codesOf(book: PriceBook, kind: MaterialKind) {
  return book.materials
    .filter((material) => material.kind === kind && material.code)
    .map((material) => ({ value: material.code, label: `${material.code} · ${material.name}` }));
}

/** Keeps a value that is no longer in the list selectable, so the error beside it makes sense. */
function withCurrent(options: Array<{ value: string; label: string }>, current: string) {
  return options.some((option) => option.value === current) || !current
    ? options
    : [{ value: current, label: `${current} (missing)` }, ...options];
}

/** Per-job charges, tax and deposit, which labor role prices each task, and the default materials. */
export function JobSettingsPanel({ draft, readOnly }: JobSettingsPanelProps) {
  const book = draft.draft;
  const settings = book.settings;
  const set = (change: Partial<JobSettings>) =>
    draft.update('settings', { ...settings, ...change });
  const error = (key: string) => draft.errors[`settings.${key}`];
  const roles = book.laborRoles
    .filter((role) => role.code)
    .map((role) => ({ value: role.code, label: `${role.code} · ${role.name}` }));
  const defaults: Array<{ key: keyof JobSettings; label: string; options: typeof roles }> = [
    { key: 'defaultLinerCode', label: 'Default liner', options: codesOf(book, 'liner') },
    {
      key: 'defaultUnderlaymentCode',
      label: 'Default underlayment',
      options: codesOf(book, 'underlayment'),
    },
    { key: 'defaultGravelCode', label: 'Default gravel', options: codesOf(book, 'gravel') },
    {
      key: 'defaultDisposalCode',
      label: 'Default disposal',
      options: book.disposal
        .filter((item) => item.code)
        .map((item) => ({ value: item.code, label: `${item.code} · ${item.name}` })),
    },
  ];

  return (
    <Stack gap="xl">
      <section aria-labelledby="job-charges-title">
        <Title order={3} fz="h5" id="job-charges-title" mb="sm">
          Charges, tax and deposit
        </Title>
        <SimpleGrid cols={{ base: 1, sm: 2, md: 3 }} spacing="md">
          <TextInput
            label="Currency"
            description="Three letters, e.g. USD."
            readOnly={readOnly}
            value={book.currency}
            error={draft.errors.currency}
            onChange={(event) => draft.update('currency', event.currentTarget.value.toUpperCase())}
          />
          {AMOUNTS.map(({ key, label, description }) => (
            <TextInput
              key={key}
              label={label}
              description={description}
              inputMode="decimal"
              readOnly={readOnly}
              value={settings[key]}
              error={error(key)}
              onChange={(event) => set({ [key]: event.currentTarget.value })}
            />
          ))}
          {PERCENTS.map(({ key, label, description }) => (
            <TextInput
              key={key}
              label={label}
              description={description}
              inputMode="decimal"
              readOnly={readOnly}
              value={settings[key]}
              error={error(key)}
              onChange={(event) => set({ [key]: event.currentTarget.value })}
            />
          ))}
        </SimpleGrid>
      </section>
      <section aria-labelledby="task-roles-title">
        <Title order={3} fz="h5" id="task-roles-title" mb="sm">
          Who does each task
        </Title>
        <SimpleGrid cols={{ base: 1, sm: 2, md: 3 }} spacing="md">
          {(Object.keys(TASK_LABELS) as Array<keyof JobSettings['taskRoles']>).map((task) => (
            <NativeSelect
              key={task}
              label={TASK_LABELS[task]}
              disabled={readOnly}
              data={withCurrent(roles, settings.taskRoles[task])}
              value={settings.taskRoles[task]}
              error={error(`taskRoles.${task}`)}
              onChange={(event) =>
                set({ taskRoles: { ...settings.taskRoles, [task]: event.currentTarget.value } })
              }
            />
          ))}
        </SimpleGrid>
      </section>
      <section aria-labelledby="defaults-title">
        <Title order={3} fz="h5" id="defaults-title" mb="sm">
          Priced unless the estimate says otherwise
        </Title>
        <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="md">
          {defaults.map(({ key, label, options }) => (
            <NativeSelect
              key={key}
              label={label}
              disabled={readOnly}
              data={withCurrent(options, settings[key] as string)}
              value={settings[key] as string}
              error={error(key)}
              onChange={(event) => set({ [key]: event.currentTarget.value })}
            />
          ))}
        </SimpleGrid>
      </section>
    </Stack>
  );
}
