import { Badge, Button, EmptyState, Group, Stack, Tabs, Text } from '@mantine/core';
import { demoPriceBook, type PriceBook } from '@pondwright/shared/pricing';
import { IconBook2, IconFileSpreadsheet, IconSparkles } from '@tabler/icons-react';
import { useState, type ReactNode } from 'react';
import { ErrorPanel } from '@/components/error-panel';
import { PageLoader } from '@/components/page-loader';
import { UnsavedChangesGuard } from '@/components/unsaved-changes-guard';
import { ApiError, isApiError } from '@/lib/api-error';
import { formatDate } from '@/lib/format';
import { notifyApiError, notifySuccess } from '@/lib/notify';
import { usePriceBook } from '../api/get-price-book';
import { useSavePriceBook } from '../api/save-price-book';
import { usePriceBookDraft } from '../hooks/use-price-book-draft';
import type { PriceBookVersion } from '../types';
import { bookPath } from '../utils/issue-messages';
import { PRICE_BOOK_TABS, type PriceBookTab } from '../utils/tabs';
import { ImportExportPanel } from './import-export-panel';
import { JobSettingsPanel } from './job-settings-panel';
import { MaterialsTable } from './materials-table';
import { PolicyForm } from './policy-form';
import { ProductionRatesPanel } from './production-rates-panel';
import { SaveVersionBar } from './save-version-bar';
import { DisposalTable, EquipmentTable, LaborTable } from './section-tables';
import { VersionHistory } from './version-history';

type PriceBookWorkspaceProps = {
  tab: PriceBookTab;
  onTabChange: (tab: PriceBookTab) => void;
  /** Estimators read the book; only owners change it. */
  readOnly: boolean;
  /** Where a move keeps the user on this page (between its tabs), so unsaved edits survive it. */
  isWithinPage: (pathname: string) => boolean;
};

const UNSAVED_REASON =
  'Save or discard your table changes first: a new version made here would leave them behind.';

type EditorProps = PriceBookWorkspaceProps & {
  saved: PriceBook;
  version: PriceBookVersion | null;
};

function PriceBookEditor({
  saved,
  version,
  tab,
  onTabChange,
  readOnly,
  isWithinPage,
}: EditorProps) {
  const draft = usePriceBookDraft(saved);
  const save = useSavePriceBook();
  const isNew = version === null;
  const unsaved = draft.changeCount > 0;
  const [policyDirty, setPolicyDirty] = useState(false);

  const errorsIn = (section: string | null) =>
    section === null
      ? 0
      : Object.keys(draft.errors).filter(
          (path) => path === section || path.startsWith(`${section}.`),
        ).length;

  const submit = ({ effectiveDate, note }: { effectiveDate: string; note: string }) =>
    save.mutate(
      { book: draft.draft, effectiveDate, note: note || undefined },
      {
        onSuccess: (created) => {
          if (created.status === 'scheduled') {
            // Today's book stays on screen; the new version waits in the history for its date.
            draft.discard();
            notifySuccess(
              `Version ${created.versionNumber} takes effect on ${formatDate(`${created.effectiveDate}T12:00:00`)}; until then the current book stays in use.`,
              'Price book scheduled',
            );
          } else {
            notifySuccess(
              `The price book is saved as version ${created.versionNumber}.`,
              'Price book saved',
            );
          }
        },
        onError: (error) => {
          if (error instanceof ApiError && error.details.length > 0) {
            draft.setServerErrors(
              Object.fromEntries(
                error.details.map((detail) => [bookPath(detail.field), detail.message]),
              ),
            );
          }
          notifyApiError(error, 'Could not save the price book');
        },
      },
    );

  const panels: Record<PriceBookTab, ReactNode> = {
    materials: <MaterialsTable draft={draft} readOnly={readOnly} />,
    labor: <LaborTable draft={draft} readOnly={readOnly} />,
    equipment: <EquipmentTable draft={draft} readOnly={readOnly} />,
    disposal: <DisposalTable draft={draft} readOnly={readOnly} />,
    rates: <ProductionRatesPanel draft={draft} readOnly={readOnly} />,
    settings: <JobSettingsPanel draft={draft} readOnly={readOnly} />,
    policy: isNew ? (
      <Text size="sm" c="dimmed">
        Save the book first; the policy is part of it and is then changed here on its own.
      </Text>
    ) : (
      <PolicyForm
        policy={saved.policy}
        readOnly={readOnly}
        blockedReason={unsaved ? UNSAVED_REASON : undefined}
        onDirtyChange={setPolicyDirty}
      />
    ),
    history: <VersionHistory />,
    'import-export': (
      <ImportExportPanel readOnly={readOnly} blockedReason={unsaved ? UNSAVED_REASON : undefined} />
    ),
  };

  return (
    <Stack gap="md">
      {/* One blocker for the page: a router keeps only one. Table edits survive moving between
          tabs; policy edits live in their tab's form, so leaving that tab asks too. */}
      <UnsavedChangesGuard
        when={(unsaved || policyDirty) && !readOnly}
        allows={(next) => isWithinPage(next.pathname) && !policyDirty}
        message={
          policyDirty
            ? 'The policy has changes that are not saved yet. If you leave now they are lost.'
            : 'The price book has changes that are not saved as a version yet. If you leave now they are lost.'
        }
      />
      <Group gap="xs">
        {version ? (
          <Text size="sm" c="dimmed">
            Version {version.versionNumber} · effective{' '}
            {formatDate(`${version.effectiveDate}T12:00:00`)} · by {version.authorName}
          </Text>
        ) : (
          <Badge color="clay" variant="light">
            New book, not saved yet
          </Badge>
        )}
        {readOnly && (
          <Badge color="stone" variant="light">
            Read only
          </Badge>
        )}
      </Group>
      <Tabs
        value={tab}
        onChange={(value) => value && onTabChange(value as PriceBookTab)}
        keepMounted={false}
      >
        <Tabs.List mb="md">
          {PRICE_BOOK_TABS.map((item) => {
            const problems = errorsIn(item.section);
            return (
              <Tabs.Tab
                key={item.value}
                value={item.value}
                rightSection={
                  problems > 0 ? (
                    <Badge size="xs" color="red" variant="filled" aria-label={`${problems} to fix`}>
                      {problems}
                    </Badge>
                  ) : undefined
                }
              >
                {item.label}
              </Tabs.Tab>
            );
          })}
        </Tabs.List>
        {PRICE_BOOK_TABS.map((item) => (
          <Tabs.Panel key={item.value} value={item.value}>
            {panels[item.value]}
          </Tabs.Panel>
        ))}
      </Tabs>
      {!readOnly && (unsaved || isNew) && (
        <SaveVersionBar
          changeCount={draft.changeCount}
          problemCount={draft.problemCount}
          saving={save.isPending}
          onSave={submit}
          onDiscard={draft.discard}
        />
      )}
    </Stack>
  );
}

function NoPriceBook(props: PriceBookWorkspaceProps) {
  const [starting, setStarting] = useState<PriceBook | null>(null);
  if (starting) return <PriceBookEditor {...props} saved={starting} version={null} />;
  if (props.tab === 'import-export' && !props.readOnly) {
    return <ImportExportPanel readOnly={false} />;
  }
  return (
    <EmptyState
      mt="xl"
      variant="light"
      icon={<IconBook2 />}
      title="No price book yet"
      description={
        props.readOnly
          ? 'An owner sets up the price book; estimates are priced from it.'
          : 'Start from a sample book and change what you pay, or import your own CSV.'
      }
    >
      {!props.readOnly && (
        <EmptyState.Actions>
          <Button
            leftSection={<IconSparkles size={16} />}
            onClick={() => setStarting(demoPriceBook())}
          >
            Start from the sample book
          </Button>
          <Button
            variant="light"
            leftSection={<IconFileSpreadsheet size={16} />}
            onClick={() => props.onTabChange('import-export')}
          >
            Import a CSV
          </Button>
        </EmptyState.Actions>
      )}
    </EmptyState>
  );
}

/** The company's price book: a tab per section, edited as a draft and saved as a new version. */
export function PriceBookWorkspace(props: PriceBookWorkspaceProps) {
  const current = usePriceBook();
  if (current.isPending) return <PageLoader label="Loading the price book…" />;
  if (isApiError(current.error, 404)) return <NoPriceBook {...props} />;
  if (current.isError) {
    return (
      <ErrorPanel
        title="Could not load the price book"
        error={current.error}
        onRetry={() => void current.refetch()}
      />
    );
  }
  // A new version starts a fresh draft from what was saved.
  return (
    <PriceBookEditor
      key={current.data.id}
      {...props}
      saved={current.data.book}
      version={current.data}
    />
  );
}
