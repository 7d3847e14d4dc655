import { Anchor, Fieldset, Group, Paper, Stack, Tabs, Text, Title } from '@mantine/core';
import type { EstimateView } from '@pondwright/shared';
import type { TakeoffInput } from '@pondwright/shared/engine';
import { IconArrowLeft } from '@tabler/icons-react';
import { useEffect } from 'react';
import { Link, useParams } from 'react-router-dom';
import { TakeoffDrawings } from '@/components/drawings/takeoff-drawings';
import { ErrorPanel } from '@/components/error-panel';
import { PageLoader } from '@/components/page-loader';
import { paths } from '@/config/paths';
import { RequireRole } from '@/features/auth/components/require-role';
import { useEstimate } from '@/features/estimates/api/get-estimate';
import { EstimateActions } from '@/features/estimates/components/estimate-actions';
import { EstimateEditNotes } from '@/features/estimates/components/estimate-edit-notes';
import { EstimateHeaderStatus } from '@/features/estimates/components/estimate-header-status';
import { EstimatePanel } from '@/features/estimates/components/estimate-panel';
import { EstimateQuotePanel } from '@/features/estimates/components/quote-panel';
import { EstimateTimeline } from '@/features/estimates/components/estimate-timeline';
import { EstimateVersions } from '@/features/estimates/components/estimate-versions';
import { useEstimateEditor } from '@/features/estimates/hooks/use-estimate-editor';
import { TakeoffWorkspace } from '@/features/takeoff/components/takeoff-workspace';

/** Hands the takeoff input, as the workspace has it, to the estimate's editor. */
function ReportInput({ input, onInput }: { input: unknown; onInput: (input: unknown) => void }) {
  useEffect(() => onInput(input), [input, onInput]);
  return null;
}

function EstimateBuilder({ estimate }: { estimate: EstimateView }) {
  const editor = useEstimateEditor(estimate);
  return (
    <Stack gap="md">
      <Group justify="space-between" align="flex-start">
        <Stack gap={4}>
          <Group gap="sm">
            <Title order={1} fz="h2">
              #{estimate.number} {estimate.title}
            </Title>
            <EstimateHeaderStatus estimate={estimate} />
          </Group>
          <Text c="dimmed" size="sm">
            {estimate.customerName} · revision {editor.revision}, saved by{' '}
            {estimate.draft.updatedByName}
          </Text>
        </Stack>
        <EstimateActions editor={editor} />
      </Group>
      <EstimateEditNotes estimate={estimate} />
      <EstimateQuotePanel estimate={estimate} />
      <Tabs defaultValue="estimate" keepMounted>
        <Tabs.List mb="md">
          <Tabs.Tab value="estimate">Estimate</Tabs.Tab>
          <Tabs.Tab value="takeoff">Takeoff</Tabs.Tab>
          <Tabs.Tab value="versions">Versions ({estimate.versions.length})</Tabs.Tab>
          <Tabs.Tab value="history">History</Tabs.Tab>
        </Tabs.List>
        <Tabs.Panel value="estimate">
          <EstimatePanel estimate={estimate} editor={editor} />
        </Tabs.Panel>
        <Tabs.Panel value="takeoff">
          {/* Locked once accepted: the disabled fieldset disables the takeoff's inputs too. */}
          <Fieldset variant="unstyled" disabled={editor.locked} p={0} m={0} miw={0}>
            <TakeoffWorkspace
              key={editor.generation}
              initialValues={estimate.draft.content.input as TakeoffInput}
              renderActions={(input) => <ReportInput input={input} onInput={editor.setInput} />}
              renderDrawings={(input, takeoff) => (
                <TakeoffDrawings input={input} takeoff={takeoff} />
              )}
            />
          </Fieldset>
        </Tabs.Panel>
        <Tabs.Panel value="versions">
          <Paper p="md">
            <EstimateVersions estimateId={estimate.id} versions={estimate.versions} />
          </Paper>
        </Tabs.Panel>
        <Tabs.Panel value="history">
          <Paper p="md">
            <EstimateTimeline estimate={estimate} />
          </Paper>
        </Tabs.Panel>
      </Tabs>
    </Stack>
  );
}

function EstimatePage({ id }: { id: string }) {
  const estimate = useEstimate(id);
  if (estimate.isPending) return <PageLoader label="Opening the estimate…" />;
  if (estimate.isError) {
    return (
      <ErrorPanel
        title="Could not open the estimate"
        error={estimate.error}
        onRetry={() => void estimate.refetch()}
      />
    );
  }
  return <EstimateBuilder estimate={estimate.data} />;
}

export function EstimateRoute() {
  const { id = '' } = useParams();
  return (
    <RequireRole area="estimates" areaName="estimates">
      <Anchor
        component={Link}
        to={paths.estimates.getHref()}
        size="sm"
        mb="sm"
        display="inline-flex"
        style={{ alignItems: 'center', gap: 4 }}
      >
        <IconArrowLeft size={14} /> All estimates
      </Anchor>
      <EstimatePage key={id} id={id} />
    </RequireRole>
  );
}
