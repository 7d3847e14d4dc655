import { Accordion, Badge, Group, Stack, Text } from '@mantine/core';
import type { ReactNode } from 'react';
import { errorsWithin } from '../utils/field-errors';
import { FORM_SECTIONS, sectionSummary, type FormSection } from '../utils/form-sections';
import { BasinsFields } from './basin-fields';
import { LightingFields } from './lighting-fields';
import { PumpRunFields } from './pump-run-fields';
import { RockFields } from './rock-fields';
import { CrewFields, RenovationFields, SiteFields } from './site-fields';
import { useTakeoffField } from './takeoff-form-context';
import { WaterMovementFields } from './water-movement-fields';

const SECTION_FIELDS: Record<FormSection, ReactNode> = {
  basins: <BasinsFields />,
  water: <WaterMovementFields />,
  pump: <PumpRunFields />,
  rock: <RockFields />,
  lighting: <LightingFields />,
  site: (
    <Stack gap="lg">
      <SiteFields />
      <RenovationFields />
    </Stack>
  ),
  crew: <CrewFields />,
};

type TakeoffFormProps = {
  openSections: FormSection[];
  onOpenSectionsChange: (sections: FormSection[]) => void;
};

/** The feature's measurements, one calm section each; the engine's messages show on the inputs. */
export function TakeoffForm({ openSections, onOpenSectionsChange }: TakeoffFormProps) {
  const { form, errors } = useTakeoffField();
  const values = form.getValues();
  return (
    <form aria-label="Takeoff measurements" noValidate onSubmit={(e) => e.preventDefault()}>
      <Accordion
        multiple
        variant="separated"
        value={openSections}
        onChange={(value) => onOpenSectionsChange(value as FormSection[])}
        chevronPosition="right"
      >
        {FORM_SECTIONS.map((section) => {
          const problems = section.fields.flatMap((field) => errorsWithin(errors, field)).length;
          return (
            <Accordion.Item key={section.value} value={section.value}>
              <Accordion.Control>
                <Group justify="space-between" wrap="nowrap" gap="xs">
                  <div>
                    <Text fw={600} size="sm">
                      {section.title}
                    </Text>
                    <Text size="xs" c="dimmed" lineClamp={1}>
                      {sectionSummary(section.value, values)}
                    </Text>
                  </div>
                  {problems > 0 && (
                    <Badge color="red" variant="light" size="sm" style={{ flexShrink: 0 }}>
                      {problems} to fix
                    </Badge>
                  )}
                </Group>
              </Accordion.Control>
              <Accordion.Panel>{SECTION_FIELDS[section.value]}</Accordion.Panel>
            </Accordion.Item>
          );
        })}
      </Accordion>
    </form>
  );
}
