import { Select, SimpleGrid, Stack } from '@mantine/core';
import type { GetInputPropsReturnType } from '@mantine/form';
import { PUMP_SETTING_LABELS, tallMan, type DoseUnit, type Drug } from '@lockstep/shared';
import { NumberField } from '@/components/ui/number-field';
import {
  NUMERIC_SETTING_FIELDS,
  OPTIONAL_SETTING_FIELDS,
  type NumericSettingField,
  type PumpSettingsFormValues,
} from '@/utils/pump-settings-form';
import { pumpSettingUnit } from '@/utils/pump-setting-format';

export interface PumpSettingsFieldsProps {
  drugs: readonly Drug[];
  /** The drug chosen in this entry, for the units; the order's unit until one is chosen. */
  drugId: string | null;
  fallbackUnit: DoseUnit;
  inputProps: (field: keyof PumpSettingsFormValues) => GetInputPropsReturnType;
}

// Every input has a line under its label, so the inputs line up across a row.
const DESCRIPTIONS: Record<NumericSettingField, string> = {
  concentrationPerMl: 'As programmed and on the syringe label',
  syringeVolumeMl: 'As programmed and on the syringe label',
  loadingDose: 'Leave empty if the pump has none',
  demandDose: 'Each press of the patient’s button',
  lockoutMinutes: 'Time after a dose before the next',
  basalRatePerHour: 'Enter 0 if the pump has none',
  oneHourLimit: 'Leave empty if the pump has none',
  fourHourLimit: 'Leave empty if the pump has none',
};

/**
 * One nurse's entry of the programmed pump: every setting, big, with its unit in the label.
 * Always starts empty. No steppers on the numbers: a stray click must never change a dose.
 */
export function PumpSettingsFields({ drugs, drugId, fallbackUnit, inputProps }: PumpSettingsFieldsProps) {
  const chosen = drugs.find((drug) => String(drug.id) === drugId);
  const unit = chosen?.doseUnit ?? fallbackUnit;
  const drugOptions = drugs.map((drug) => ({ value: String(drug.id), label: tallMan(drug.genericName) }));

  return (
    <Stack gap="lg">
      <Select
        label={PUMP_SETTING_LABELS.drugId}
        placeholder="Choose the drug on the pump"
        data={drugOptions}
        size="lg"
        searchable
        allowDeselect={false}
        withAsterisk
        maw={420}
        {...inputProps('drugId')}
      />
      <SimpleGrid cols={{ base: 1, sm: 2, lg: 3 }} spacing="lg" verticalSpacing="lg">
        {NUMERIC_SETTING_FIELDS.map((field) => (
          <NumberField
            key={field}
            label={`${PUMP_SETTING_LABELS[field]} (${pumpSettingUnit(field, unit)})`}
            description={DESCRIPTIONS[field]}
            size="lg"
            withAsterisk={!OPTIONAL_SETTING_FIELDS.includes(field)}
            {...inputProps(field)}
          />
        ))}
      </SimpleGrid>
    </Stack>
  );
}
