import { Group, Select, TextInput } from '@mantine/core';
import { IconSearch } from '@tabler/icons-react';
import type { Ward } from '@lockstep/shared';

export const ALL_WARDS = 'all';

export interface PatientFiltersProps {
  wards: Ward[];
  wardsLoading: boolean;
  ward: string;
  search: string;
  onWardChange: (ward: string) => void;
  onSearchChange: (search: string) => void;
}

export function PatientFilters({ wards, wardsLoading, ward, search, onWardChange, onSearchChange }: PatientFiltersProps) {
  const wardOptions = [{ value: ALL_WARDS, label: 'All wards' }, ...wards.map((w) => ({ value: String(w.id), label: w.name }))];
  return (
    <Group gap="sm" align="flex-end" wrap="wrap">
      <Select
        label="Ward"
        data={wardOptions}
        value={ward}
        onChange={(value) => onWardChange(value ?? ALL_WARDS)}
        allowDeselect={false}
        disabled={wardsLoading}
        w={220}
      />
      <TextInput
        label="Search"
        placeholder="Name or MRN"
        value={search}
        onChange={(event) => onSearchChange(event.currentTarget.value)}
        leftSection={<IconSearch size={16} aria-hidden />}
        w={280}
      />
    </Group>
  );
}
