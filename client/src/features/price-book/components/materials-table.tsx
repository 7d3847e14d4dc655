import { Button, Text } from '@mantine/core';
import {
  MATERIAL_KIND_RULES,
  MATERIAL_KINDS,
  MATERIAL_UNITS,
  type Material,
  type MaterialKind,
} from '@pondwright/shared/pricing';
import { IconAdjustmentsHorizontal, IconChartLine } from '@tabler/icons-react';
import { useState } from 'react';
import { DataTable, type DataTableColumn } from '@/components/data-table';
import type { PriceBookDraft } from '../hooks/use-price-book-draft';
import { ATTRIBUTE_LABELS, KIND_LABELS } from '@/lib/price-book-labels';
import { MaterialDetailsModal } from './material-details-modal';
import { codeColumn, moneyColumn, nameColumn } from './section-tables';

const ROW_FIELDS = new Set(['code', 'name', 'kind', 'unit', 'unitCost', 'taxable']);
const KIND_OPTIONS = MATERIAL_KINDS.map((kind) => ({ value: kind, label: KIND_LABELS[kind] }));

/** A short reading of the attributes that matter for the kind, e.g. "45 mil" or "4 curve points". */
function detailsSummary(material: Material): string {
  if (material.kind === 'pump') {
    const points = material.pumpCurve?.length ?? 0;
    return points === 1 ? '1 curve point' : `${points} curve points`;
  }
  return MATERIAL_KIND_RULES[material.kind].requires
    .map((attribute) => {
      const value = material[attribute];
      return value === undefined ? null : `${ATTRIBUTE_LABELS[attribute]}: ${String(value)}`;
    })
    .filter(Boolean)
    .join(' · ');
}

function columns(): Array<DataTableColumn<Material>> {
  return [
    codeColumn(),
    nameColumn(),
    {
      key: 'kind',
      header: 'Kind',
      editor: {
        type: 'select',
        options: KIND_OPTIONS,
        get: (row) => row.kind,
        // A new kind brings its own unit, the only one it may be priced by.
        set: (row, value) => ({
          ...row,
          kind: value as MaterialKind,
          unit: MATERIAL_KIND_RULES[value as MaterialKind].unit,
        }),
      },
      sortValue: (row) => KIND_LABELS[row.kind],
      minWidth: 170,
    },
    {
      key: 'unit',
      header: 'Unit',
      editor: {
        type: 'select',
        options: MATERIAL_UNITS.map((unit) => ({ value: unit, label: unit })),
        get: (row) => row.unit,
        set: (row, value) => ({ ...row, unit: value as Material['unit'] }),
      },
      minWidth: 110,
    },
    moneyColumn<Material>('unitCost', 'Unit cost'),
    {
      key: 'taxable',
      header: 'Taxable',
      editor: {
        type: 'checkbox',
        get: (row) => row.taxable,
        set: (row, value) => ({ ...row, taxable: value }),
      },
      minWidth: 80,
    },
    {
      key: 'details',
      header: 'Details',
      render: (row) => (
        <Text size="xs" c="dimmed" maw={220}>
          {detailsSummary(row)}
        </Text>
      ),
      minWidth: 180,
    },
  ];
}

type MaterialsTableProps = { draft: PriceBookDraft; readOnly: boolean };

export function MaterialsTable({ draft, readOnly }: MaterialsTableProps) {
  const [openIndex, setOpenIndex] = useState<number | null>(null);
  const materials = draft.draft.materials;
  const open = openIndex === null ? undefined : materials[openIndex];

  const cellError = (index: number, key: string) => {
    if (key !== 'details') return draft.errors[`materials.${index}.${key}`];
    // Attribute problems (a liner's thickness, a pump's curve) show in the Details column.
    const prefix = `materials.${index}.`;
    const attribute = Object.keys(draft.errors).find(
      (path) => path.startsWith(prefix) && !ROW_FIELDS.has(path.slice(prefix.length)),
    );
    return attribute && draft.errors[attribute];
  };

  return (
    <>
      <DataTable
        label="Materials"
        rows={materials}
        columns={columns()}
        rowLabel={(row, index) => row.code || `new material ${index + 1}`}
        searchText={(row) => `${row.code} ${row.name} ${KIND_LABELS[row.kind]}`}
        filter={{
          label: 'Filter by kind',
          options: KIND_OPTIONS,
          matches: (row, kind) => row.kind === kind,
        }}
        readOnly={readOnly}
        cellError={cellError}
        onRowChange={(index, row) => draft.updateRow('materials', index, row)}
        onAdd={() =>
          draft.addRow('materials', {
            code: '',
            name: '',
            kind: 'extra',
            unit: 'each',
            unitCost: '',
            taxable: true,
          })
        }
        addLabel="Add a material"
        onDelete={(index) => draft.deleteRow('materials', index)}
        rowActions={(row, index) => {
          const label = row.kind === 'pump' ? 'Pump curve' : 'Details';
          const Icon = row.kind === 'pump' ? IconChartLine : IconAdjustmentsHorizontal;
          return (
            <Button
              size="compact-xs"
              variant="subtle"
              leftSection={<Icon size={14} />}
              aria-label={`${label} for ${row.code || `new material ${index + 1}`}`}
              onClick={() => setOpenIndex(index)}
            >
              {label}
            </Button>
          );
        }}
        emptyLabel="No materials yet."
      />
      {open && openIndex !== null && (
        <MaterialDetailsModal
          material={open}
          index={openIndex}
          errors={draft.errors}
          readOnly={readOnly}
          onChange={(material) => draft.updateRow('materials', openIndex, material)}
          onClose={() => setOpenIndex(null)}
        />
      )}
    </>
  );
}
