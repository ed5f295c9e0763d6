import { TextInput } from '@mantine/core';
import type { GetInputPropsReturnType } from '@mantine/form';
import { IconBarcode } from '@tabler/icons-react';

/** A syringe's release code, scanned or typed: no autocorrect, capitals, the code's own digits. */
export function ReleaseCodeInput({
  label,
  description,
  inputProps,
}: {
  label: string;
  description: string;
  inputProps: GetInputPropsReturnType;
}) {
  return (
    <TextInput
      label={label}
      description={description}
      size="lg"
      maw={420}
      autoComplete="off"
      autoCapitalize="characters"
      spellCheck={false}
      withAsterisk
      leftSection={<IconBarcode size={22} aria-hidden />}
      classNames={{ input: 'tabular-nums' }}
      {...inputProps}
    />
  );
}
