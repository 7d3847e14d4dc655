import { Button, Group, Loader, Modal, NativeSelect, Stack, Text, TextInput } from '@mantine/core';
import {
  MATERIAL_KIND_RULES,
  type Material,
  type MaterialAttributes,
  type PumpCurvePoint,
} from '@pondwright/shared/pricing';
import { lazy, Suspense } from 'react';
import { NumberTextInput } from '@/components/number-text-input';
import { ATTRIBUTE_LABELS, KIND_LABELS } from '@/lib/price-book-labels';

// The chart library is large and only pumps need it, so it loads when a pump is opened.
const PumpCurveEditor = lazy(async () => ({
  default: (await import('./pump-curve-editor')).PumpCurveEditor,
}));

const BOULDER_OPTIONS = [
  { value: 'small', label: 'Small' },
  { value: 'medium', label: 'Medium' },
  { value: 'large', label: 'Large' },
];
const FITTING_OPTIONS = [
  { value: 'elbow90', label: '90° elbow' },
  { value: 'elbow45', label: '45° elbow' },
  { value: 'tee', label: 'Tee' },
  { value: 'checkValve', label: 'Check valve' },
  { value: 'valve', label: 'Valve' },
];

type Attribute = Exclude<keyof MaterialAttributes, 'pumpCurve'>;
const TEXT_ATTRIBUTES = new Set<Attribute>(['pipeMaterial', 'cableGaugeAwg']);
const SELECT_ATTRIBUTES: Partial<Record<Attribute, typeof BOULDER_OPTIONS>> = {
  boulderSize: BOULDER_OPTIONS,
  fittingKind: FITTING_OPTIONS,
};

type MaterialDetailsModalProps = {
  material: Material;
  index: number;
  errors: Record<string, string>;
  readOnly: boolean;
  onChange: (material: Material) => void;
  onClose: () => void;
};

/** The attributes a material's kind needs, e.g. a liner's thickness or a pump's curve. */
export function MaterialDetailsModal({
  material,
  index,
  errors,
  readOnly,
  onChange,
  onClose,
}: MaterialDetailsModalProps) {
  const rule = MATERIAL_KIND_RULES[material.kind];
  const attributes = [
    ...rule.requires,
    ...(material.kind === 'liner' ? (['linerWeightLbPerSqFt'] as const) : []),
  ].filter((attribute): attribute is Attribute => attribute !== 'pumpCurve');
  const errorFor = (field: string) => errors[`materials.${index}.${field}`];
  const set = (attribute: string, value: unknown) =>
    onChange({ ...material, [attribute]: value === '' ? undefined : value } as Material);
  const title = `${material.name || material.code || 'New material'} · ${KIND_LABELS[material.kind]}`;

  return (
    <Modal opened onClose={onClose} title={title} size={material.kind === 'pump' ? 'xl' : 'md'}>
      <Stack gap="md">
        {attributes.length === 0 && material.kind !== 'pump' && (
          <Text size="sm" c="dimmed">
            A {KIND_LABELS[material.kind].toLowerCase()} needs nothing beyond its code, name and
            cost.
          </Text>
        )}
        {attributes.map((attribute) => {
          const label = ATTRIBUTE_LABELS[attribute];
          const value = material[attribute];
          const options = SELECT_ATTRIBUTES[attribute];
          if (options) {
            return (
              <NativeSelect
                key={attribute}
                label={label}
                disabled={readOnly}
                data={[{ value: '', label: 'Choose…' }, ...options]}
                value={String(value ?? '')}
                error={errorFor(attribute)}
                onChange={(event) => set(attribute, event.currentTarget.value)}
              />
            );
          }
          if (TEXT_ATTRIBUTES.has(attribute)) {
            return (
              <TextInput
                key={attribute}
                label={label}
                readOnly={readOnly}
                value={String(value ?? '')}
                error={errorFor(attribute)}
                onChange={(event) => set(attribute, event.currentTarget.value)}
              />
            );
          }
          return (
            <NumberTextInput
              key={attribute}
              label={label}
              readOnly={readOnly}
              value={value as number | undefined}
              error={errorFor(attribute)}
              onChange={(next) => set(attribute, next)}
            />
          );
        })}
        {material.kind === 'pump' && (
          <Suspense fallback={<Loader size="sm" aria-label="Loading the curve editor" />}>
            <PumpCurveEditor
              points={material.pumpCurve ?? []}
              readOnly={readOnly}
              errorFor={(field) => errorFor(field === '' ? 'pumpCurve' : `pumpCurve.${field}`)}
              onChange={(points: PumpCurvePoint[]) => set('pumpCurve', points)}
            />
          </Suspense>
        )}
        <Group justify="flex-end">
          <Button onClick={onClose}>Done</Button>
        </Group>
      </Stack>
    </Modal>
  );
}
