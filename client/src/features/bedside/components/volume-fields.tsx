import { NumberInput, SimpleGrid } from '@mantine/core';
import type { GetInputPropsReturnType } from '@mantine/form';

export interface VolumeFieldsProps {
  infusedLabel: string;
  infused: GetInputPropsReturnType;
  wasted: GetInputPropsReturnType;
}

const numberProps = {
  size: 'lg',
  hideControls: true,
  allowNegative: false,
  decimalSeparator: '.',
  thousandSeparator: false,
  inputMode: 'decimal',
  autoComplete: 'off',
  withAsterisk: true,
  classNames: { input: 'tabular-nums' },
} as const;

/** The pump's volume infused and the witnessed waste, in mL, for a reconciliation. */
export function VolumeFields({ infusedLabel, infused, wasted }: VolumeFieldsProps) {
  return (
    <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="lg">
      <NumberInput label={`${infusedLabel} (mL)`} description="The pump’s reading for this syringe" {...numberProps} {...infused} />
      <NumberInput
        label="Volume wasted (mL)"
        description="Left in the syringe, wasted in front of the witness"
        {...numberProps}
        {...wasted}
      />
    </SimpleGrid>
  );
}
