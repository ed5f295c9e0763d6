import { NumberInput, type NumberInputProps } from '@mantine/core';

export interface NumberFieldProps extends NumberInputProps {
  /** Whole numbers only: no decimal point, and a numeric keypad on a tablet. */
  integer?: boolean;
}

/**
 * A number as typed, read with `readNumber` (lib/number-input). No steppers: a stray click must
 * never change a reading. A plain decimal point, no thousands separator, no minus.
 */
export function NumberField({ integer = false, ...props }: NumberFieldProps) {
  return (
    <NumberInput
      hideControls
      allowNegative={false}
      allowDecimal={!integer}
      decimalSeparator="."
      thousandSeparator={false}
      inputMode={integer ? 'numeric' : 'decimal'}
      autoComplete="off"
      withAsterisk
      classNames={{ input: 'tabular-nums' }}
      {...props}
    />
  );
}
