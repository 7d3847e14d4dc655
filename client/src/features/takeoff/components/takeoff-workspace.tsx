import {
  Box,
  Grid,
  Group,
  Loader,
  Paper,
  SegmentedControl,
  Stack,
  Text,
  Title,
  useMantineTheme,
  useMatches,
} from '@mantine/core';
import type { Takeoff, TakeoffInput, UnitSystem } from '@pondwright/shared/engine';
import { useCallback, useMemo, useState, type ReactNode } from 'react';
import { anyOutlineBendsInward, usePolygonInset } from '../hooks/use-polygon-inset';
import { useTakeoffPreview } from '../hooks/use-takeoff-preview';
import { DEFAULT_TAKEOFF_INPUT } from '../utils/default-input';
import { sectionOf, type FormSection } from '../utils/form-sections';
import { toEngineInput } from '../utils/to-engine-input';
import { ErrorSummary } from './error-summary';
import { ServerCheck } from './server-check';
import {
  FieldErrorsContext,
  inputId,
  TakeoffFormProvider,
  useTakeoffForm,
} from './takeoff-form-context';
import { TakeoffForm } from './takeoff-form';
import { TakeoffResults } from './takeoff-results';

const UNIT_SYSTEMS = [
  { value: 'us', label: 'US units' },
  { value: 'metric', label: 'Metric' },
];

/** The element for a field, or for the nearest group around it that has one. */
function findFieldElement(field: string): HTMLElement | null {
  const segments = field.split('.');
  while (segments.length > 0) {
    const element = document.getElementById(inputId(segments.join('.')));
    if (element) return element;
    segments.pop();
  }
  return null;
}

type TakeoffWorkspaceProps = {
  initialValues?: TakeoffInput;
  /** The units the screen starts in (the company's default); one switch sets entry and results. */
  unitSystem?: UnitSystem;
  /** Actions beside the result that need the takeoff as it stands, e.g. saving it with a price. */
  renderActions?: (input: unknown) => ReactNode;
  /** Drawn above the figures, e.g. the plan and cross-section of the measurements as they stand. */
  renderDrawings?: (input: unknown, takeoff: Takeoff) => ReactNode;
};

/** The takeoff screen: measurements on the left, the engine's figures on the right as they are typed. */
export function TakeoffWorkspace({
  initialValues = DEFAULT_TAKEOFF_INPUT,
  unitSystem = initialValues.unitSystem,
  renderActions,
  renderDrawings,
}: TakeoffWorkspaceProps) {
  const theme = useMantineTheme();
  const form = useTakeoffForm({
    mode: 'controlled',
    initialValues: { ...(JSON.parse(JSON.stringify(initialValues)) as TakeoffInput), unitSystem },
  });
  const values = form.getValues();
  const polygons = usePolygonInset(anyOutlineBendsInward(values));
  const preview = useTakeoffPreview(values, polygons.geometry, polygons.loading);
  const engineInput = useMemo(() => toEngineInput(values), [values]);
  const [openSections, setOpenSections] = useState<FormSection[]>(['basins']);

  const showField = useCallback((field: string) => {
    const section = sectionOf(field);
    if (section) {
      setOpenSections((open) => (open.includes(section) ? open : [...open, section]));
    }
    // After the section has opened.
    window.setTimeout(() => {
      const element = findFieldElement(field);
      element?.scrollIntoView({ block: 'center', behavior: 'smooth' });
      element?.focus({ preventScroll: true });
    }, 250);
  }, []);

  // Side by side, the result scrolls on its own so the figures stay beside the field being typed in.
  const sideBySide = useMatches({ base: false, md: true });
  const top = `calc(${theme.other.headerHeight as number}px + var(--mantine-spacing-lg))`;
  const resultStyle = sideBySide
    ? {
        position: 'sticky' as const,
        top,
        maxHeight: `calc(100dvh - ${top} - var(--mantine-spacing-lg))`,
        overflowY: 'auto' as const,
        overscrollBehavior: 'contain' as const,
        paddingRight: 'var(--mantine-spacing-xs)',
      }
    : undefined;

  return (
    <TakeoffFormProvider form={form}>
      <FieldErrorsContext.Provider value={preview.errorMap}>
        <Grid gap="lg" align="flex-start">
          <Grid.Col span={{ base: 12, md: 5 }}>
            <TakeoffForm openSections={openSections} onOpenSectionsChange={setOpenSections} />
          </Grid.Col>
          <Grid.Col span={{ base: 12, md: 7 }}>
            <Box component="section" aria-labelledby="takeoff-result-title" style={resultStyle}>
              <Stack gap="md">
                <Paper p="sm">
                  <Stack gap="xs">
                    <Group justify="space-between" gap="sm">
                      <Group gap="xs">
                        <Title order={2} fz="h4" id="takeoff-result-title">
                          Result
                        </Title>
                        {preview.updating && <Loader size="xs" aria-label="Updating" />}
                      </Group>
                      <Group gap="xs">
                        {renderActions?.(engineInput)}
                        <SegmentedControl
                          size="xs"
                          aria-label="Units for measurements and results"
                          data={UNIT_SYSTEMS}
                          {...form.getInputProps('unitSystem')}
                        />
                      </Group>
                    </Group>
                    <ServerCheck
                      input={engineInput}
                      geometry={polygons.geometry}
                      onShowField={showField}
                    />
                  </Stack>
                </Paper>
                {preview.errors.length > 0 && (
                  <ErrorSummary
                    title={
                      preview.errors.length === 1
                        ? 'One field needs another look'
                        : `${preview.errors.length} fields need another look`
                    }
                    errors={preview.errors}
                    onShowField={showField}
                  >
                    {preview.stale && (
                      <Text size="sm" mb="xs">
                        The figures below are from the last measurements that computed.
                      </Text>
                    )}
                  </ErrorSummary>
                )}
                {preview.takeoff && (
                  <Box
                    style={{ opacity: preview.stale ? 0.55 : 1, transition: 'opacity 150ms' }}
                    aria-busy={preview.updating}
                  >
                    {renderDrawings && (
                      <Box mb="lg">{renderDrawings(engineInput, preview.takeoff)}</Box>
                    )}
                    <TakeoffResults takeoff={preview.takeoff} onShowField={showField} />
                  </Box>
                )}
              </Stack>
            </Box>
          </Grid.Col>
        </Grid>
      </FieldErrorsContext.Provider>
    </TakeoffFormProvider>
  );
}
