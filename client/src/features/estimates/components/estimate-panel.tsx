import {
  Alert,
  Fieldset,
  Grid,
  List,
  Paper,
  Stack,
  Textarea,
  TextInput,
  Title,
} from '@mantine/core';
import type { EstimateView } from '@pondwright/shared';
import type { EstimateEditor } from '../hooks/use-estimate-editor';
import { ManualLinesEditor } from './manual-lines-editor';
import { PricedEstimateView } from '@/components/priced-estimate-view';

type EstimatePanelProps = { estimate: EstimateView; editor: EstimateEditor };

/** The draft as the server priced it, and the parts of it the estimator edits beside the takeoff. */
export function EstimatePanel({ estimate, editor }: EstimatePanelProps) {
  const { content, setContent, fieldErrors } = editor;
  const errorFor = (field: string) => fieldErrors.find((error) => error.field === field)?.message;
  const otherErrors = fieldErrors.filter(
    (error) => !/^(manualLines\.|discountPct$|scope$|notes$|title$)/.test(error.field),
  );

  return (
    <Stack gap="md">
      {otherErrors.length > 0 && (
        <Alert color="red" variant="light" title="The server could not price this draft">
          <List size="sm">
            {otherErrors.map((error) => (
              <List.Item key={error.field}>
                {error.field}: {error.message}
              </List.Item>
            ))}
          </List>
        </Alert>
      )}
      <Paper p="md" component="section" aria-labelledby="estimate-priced-title">
        <Title order={2} fz="h4" id="estimate-priced-title" mb="sm">
          Priced lines (revision {estimate.draft.revision})
        </Title>
        <PricedEstimateView
          priced={estimate.draft.computed.priced}
          cautions={estimate.draft.computed.takeoff.cautions}
        />
      </Paper>
      {/* An accepted estimate is locked: a disabled fieldset disables every control inside it. */}
      <Fieldset variant="unstyled" disabled={editor.locked} p={0} m={0} miw={0}>
        <Stack gap="md">
          <Paper p="md" component="section" aria-labelledby="estimate-manual-title">
            <Title order={2} fz="h4" id="estimate-manual-title" mb="sm">
              Manual lines
            </Title>
            <ManualLinesEditor
              lines={content.manualLines}
              errors={fieldErrors}
              onChange={(manualLines) => setContent({ ...content, manualLines })}
            />
          </Paper>
          <Paper p="md" component="section" aria-labelledby="estimate-terms-title">
            <Title order={2} fz="h4" id="estimate-terms-title" mb="sm">
              Terms
            </Title>
            <Grid>
              <Grid.Col span={{ base: 12, sm: 8 }}>
                <TextInput
                  label="Title"
                  value={content.title}
                  error={errorFor('title')}
                  onChange={(event) => setContent({ ...content, title: event.currentTarget.value })}
                />
              </Grid.Col>
              <Grid.Col span={{ base: 12, sm: 4 }}>
                <TextInput
                  label="Discount %"
                  inputMode="decimal"
                  value={content.discountPct}
                  error={errorFor('discountPct')}
                  onChange={(event) =>
                    setContent({ ...content, discountPct: event.currentTarget.value })
                  }
                />
              </Grid.Col>
              <Grid.Col span={12}>
                <Textarea
                  label="Scope of work"
                  resize="vertical"
                  rows={3}
                  value={content.scope}
                  error={errorFor('scope')}
                  onChange={(event) => setContent({ ...content, scope: event.currentTarget.value })}
                />
              </Grid.Col>
              <Grid.Col span={12}>
                <Textarea
                  label="Notes"
                  resize="vertical"
                  rows={2}
                  value={content.notes}
                  error={errorFor('notes')}
                  onChange={(event) => setContent({ ...content, notes: event.currentTarget.value })}
                />
              </Grid.Col>
            </Grid>
          </Paper>
        </Stack>
      </Fieldset>
    </Stack>
  );
}
