import { Button, Group, MultiSelect } from '@mantine/core';
import type { Ward } from '@lockstep/shared';
import { ALL_WARDS, sameWardChoice, type WardChoice } from '../utils/ward-choice';

export interface WardChoiceFilterProps {
  wards: readonly Ward[];
  wardsLoading: boolean;
  choice: WardChoice;
  ownWardIds: readonly number[];
  onChange: (choice: WardChoice) => void;
}

/**
 * Which wards a nurse's list shows: several at once (a nurse covering two wards), with "My wards"
 * and "All wards" one click away. Emptying the field shows every ward.
 */
export function WardChoiceFilter({ wards, wardsLoading, choice, ownWardIds, onChange }: WardChoiceFilterProps) {
  const mine = ownWardIds.length > 0 && !sameWardChoice(choice, ownWardIds);
  return (
    <Group gap="xs" align="flex-end" wrap="wrap">
      <MultiSelect
        label="Wards"
        data={wards.map((ward) => ({ value: String(ward.id), label: ward.name }))}
        value={choice === ALL_WARDS ? [] : choice.map(String)}
        onChange={(ids) => onChange(ids.length > 0 ? ids.map(Number) : ALL_WARDS)}
        placeholder={choice === ALL_WARDS ? 'All wards' : undefined}
        disabled={wardsLoading}
        clearable
        miw={260}
        maw={480}
      />
      {mine ? (
        <Button variant="default" onClick={() => onChange(ownWardIds)}>
          My wards
        </Button>
      ) : null}
      {choice === ALL_WARDS ? null : (
        <Button variant="default" onClick={() => onChange(ALL_WARDS)}>
          All wards
        </Button>
      )}
    </Group>
  );
}
