import { MultiSelect, type MultiSelectProps } from '@mantine/core';
import type { Ward } from '@lockstep/shared';

export interface WardMultiSelectProps extends Omit<MultiSelectProps, 'data' | 'value' | 'onChange'> {
  wards: Ward[];
  value: number[];
  onChange: (wardIds: number[]) => void;
}

/** Ward choice by id: MultiSelect works in strings, the API in numbers. */
export function WardMultiSelect({ wards, value, onChange, ...props }: WardMultiSelectProps) {
  return (
    <MultiSelect
      {...props}
      data={wards.map((ward) => ({ value: String(ward.id), label: ward.name }))}
      value={value.map(String)}
      onChange={(ids) => onChange(ids.map(Number))}
      searchable
      clearable
    />
  );
}
