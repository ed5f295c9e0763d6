import { PasswordInput, SimpleGrid, TextInput } from '@mantine/core';
import type { GetInputPropsReturnType } from '@mantine/form';

export interface ColleagueFieldsProps {
  /** "Second nurse" or "Witness": the start of each field's label. */
  who: string;
  username: GetInputPropsReturnType;
  password: GetInputPropsReturnType;
}

/**
 * A colleague signs on this screen with their own username and password. Nothing is remembered
 * or filled in by the browser: the person at the keyboard changes.
 */
export function ColleagueFields({ who, username, password }: ColleagueFieldsProps) {
  return (
    <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="lg">
      <TextInput
        label={`${who} username`}
        size="lg"
        autoComplete="off"
        autoCapitalize="none"
        spellCheck={false}
        withAsterisk
        {...username}
      />
      <PasswordInput label={`${who} password`} size="lg" autoComplete="off" withAsterisk {...password} />
    </SimpleGrid>
  );
}
