import { SimpleGrid } from '@mantine/core';
import type { GetInputPropsReturnType } from '@mantine/form';
import { NumberField } from '@/components/ui/number-field';

export interface VolumeFieldsProps {
  infusedLabel: string;
  infused: GetInputPropsReturnType;
  wasted: GetInputPropsReturnType;
}

/** The pump's volume infused and the witnessed waste, in mL, for a reconciliation. */
export function VolumeFields({ infusedLabel, infused, wasted }: VolumeFieldsProps) {
  return (
    <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="lg">
      <NumberField label={`${infusedLabel} (mL)`} description="The pump’s reading for this syringe" size="lg" {...infused} />
      <NumberField label="Volume wasted (mL)" description="Left in the syringe, wasted in front of the witness" size="lg" {...wasted} />
    </SimpleGrid>
  );
}
