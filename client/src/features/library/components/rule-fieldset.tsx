import { Button, Checkbox, Fieldset, Group, NumberInput, Select, Table, Text, TextInput } from '@mantine/core';
import type { UseFormReturnType } from '@mantine/form';
import { IconTrash } from '@tabler/icons-react';
import {
  DOSE_FIELDS,
  LIMIT_KEYS,
  POPULATION_LABELS,
  POPULATIONS,
  REGIMEN_FIELD_LABELS,
  REGIMEN_FIELDS,
  regimenFieldUnit,
  tallMan,
  type BandField,
  type Drug,
} from '@lockstep/shared';
import type { RulesFormValues } from '../utils/rule-form';
import { LIMIT_LABELS, ruleTitle } from '../utils/rule-rows';
import classes from './library.module.css';

export interface RuleFieldsetProps {
  form: UseFormReturnType<RulesFormValues>;
  index: number;
  drugs: readonly Drug[];
}

const BANDS: { field: BandField; label: string; unit: string }[] = [
  { field: 'minAgeYears', label: 'Age from', unit: 'years' },
  { field: 'maxAgeYears', label: 'Age under', unit: 'years' },
  { field: 'minWeightKg', label: 'Weight from', unit: 'kg' },
  { field: 'maxWeightKg', label: 'Weight under', unit: 'kg' },
];

/**
 * One limit rule in the editor: drug, concentration, per kg, who it is for (adult, or children in
 * an age and weight band), four limits per parameter and, per kg, each dose's absolute ceiling.
 */
export function RuleFieldset({ form, index, drugs }: RuleFieldsetProps) {
  const path = `rules.${index}` as const;
  const rule = form.values.rules[index];
  const drug = drugs.find((candidate) => String(candidate.id) === rule.drugId);
  const concentration = typeof rule.concentrationPerMl === 'number' ? rule.concentrationPerMl : null;
  const title =
    drug && concentration
      ? `: ${ruleTitle({ drugName: drug.genericName, concentrationPerMl: concentration, doseUnit: drug.doseUnit })}`
      : '';
  const doseUnit = drug?.doseUnit ?? rule.doseUnit;

  return (
    <Fieldset legend={`Rule ${index + 1}${title}`} variant="filled">
      <Group align="flex-start" gap="md" wrap="wrap" mb="sm">
        <Select
          label="Drug"
          placeholder="Choose"
          data={drugs.map((d) => ({ value: String(d.id), label: tallMan(d.genericName) }))}
          allowDeselect={false}
          w={190}
          {...form.getInputProps(`${path}.drugId`)}
          onChange={(value) => {
            form.setFieldValue(`${path}.drugId`, value);
            form.setFieldValue(`${path}.doseUnit`, drugs.find((d) => String(d.id) === value)?.doseUnit ?? null);
          }}
        />
        <NumberInput
          label="Concentration"
          min={0}
          decimalScale={4}
          hideControls
          rightSection={
            <Text size="xs" c="dimmed">
              {doseUnit ? `${doseUnit}/mL` : 'per mL'}
            </Text>
          }
          rightSectionWidth={64}
          w={170}
          {...form.getInputProps(`${path}.concentrationPerMl`)}
        />
        <TextInput
          label="Dose unit"
          title="Set by the drug"
          readOnly
          variant="filled"
          value={doseUnit ?? ''}
          w={90}
          error={form.errors[`${path}.doseUnit`]}
        />
        <Checkbox label="Limits per kg of body weight" mt={30} {...form.getInputProps(`${path}.perKg`, { type: 'checkbox' })} />
        <Select
          label="For"
          data={POPULATIONS.map((population) => ({ value: population, label: POPULATION_LABELS[population] }))}
          allowDeselect={false}
          w={140}
          {...form.getInputProps(`${path}.population`)}
        />
        <Button
          variant="subtle"
          color="red"
          ml="auto"
          mt={24}
          leftSection={<IconTrash size={16} aria-hidden />}
          aria-label={`Remove rule ${index + 1}`}
          onClick={() => form.removeListItem('rules', index)}
        >
          Remove rule
        </Button>
      </Group>
      {rule.population === 'paediatric' ? (
        <Group align="flex-start" gap="md" wrap="wrap" mb="sm">
          {BANDS.map(({ field, label, unit }) => (
            <NumberInput
              key={field}
              label={label}
              description="Empty: no bound"
              min={0}
              decimalScale={2}
              hideControls
              rightSection={
                <Text size="xs" c="dimmed">
                  {unit}
                </Text>
              }
              rightSectionWidth={48}
              w={140}
              {...form.getInputProps(`${path}.${field}`)}
            />
          ))}
        </Group>
      ) : null}
      {/* Fixed layout: every rule's columns line up with the rule above it. */}
      <Table aria-label={`Rule ${index + 1} limits`} tabularNums verticalSpacing={4} withRowBorders={false} layout="fixed">
        <Table.Thead>
          <Table.Tr>
            <Table.Th scope="col" w={200}>
              Parameter
            </Table.Th>
            {LIMIT_KEYS.map((key) => (
              <Table.Th key={key} scope="col">
                {LIMIT_LABELS[key]}
              </Table.Th>
            ))}
            {rule.perKg ? <Table.Th scope="col">Ceiling ({doseUnit ?? 'mg'}, any weight)</Table.Th> : null}
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {REGIMEN_FIELDS.map((field) => (
            <Table.Tr key={field}>
              <Table.Th scope="row" className={classes.parameterCell}>
                {REGIMEN_FIELD_LABELS[field]}{' '}
                <Text span size="xs" c="dimmed">
                  ({regimenFieldUnit(field, doseUnit ?? 'mg', rule.perKg)})
                </Text>
              </Table.Th>
              {LIMIT_KEYS.map((key) => (
                <Table.Td key={key} valign="top">
                  <NumberInput
                    size="xs"
                    min={0}
                    decimalScale={4}
                    hideControls
                    aria-label={`${REGIMEN_FIELD_LABELS[field]} ${LIMIT_LABELS[key].toLowerCase()}`}
                    {...form.getInputProps(`${path}.limits.${field}.${key}`)}
                  />
                </Table.Td>
              ))}
              {rule.perKg ? (
                <Table.Td valign="top">
                  {DOSE_FIELDS.includes(field) ? (
                    <NumberInput
                      size="xs"
                      min={0}
                      decimalScale={4}
                      hideControls
                      aria-label={`${REGIMEN_FIELD_LABELS[field]} ceiling`}
                      {...form.getInputProps(`${path}.limits.${field}.ceiling`)}
                    />
                  ) : null}
                </Table.Td>
              ) : null}
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Fieldset>
  );
}
