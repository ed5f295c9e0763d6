import { Button, Group, Select, SimpleGrid, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconFilterOff, IconSearch } from '@tabler/icons-react';
import { AUDIT_ENTITY_TYPES, type AuditEntityType } from '@lockstep/shared';
import { ENTITY_TYPE_LABELS } from '../utils/audit-entity';
import { actionEntityType, actionOptions, EMPTY_FILTERS, filterErrors, type AuditFilters } from '../utils/audit-filters';

export interface UserOption {
  value: string;
  label: string;
}

export interface AuditFiltersFormProps {
  initial: AuditFilters;
  entityTypes: readonly AuditEntityType[];
  /** People to pick from; null leaves the person filter out (pharmacists). */
  users: UserOption[] | null;
  usersLoading: boolean;
  onSearch: (filters: AuditFilters) => void;
}

function isEntityType(types: readonly AuditEntityType[], value: string | null): value is AuditEntityType {
  return types.some((type) => type === value);
}

/** What to look for: the kind of record, which one, who, what and between when. */
export function AuditFiltersForm({ initial, entityTypes, users, usersLoading, onSearch }: AuditFiltersFormProps) {
  const form = useForm<AuditFilters>({ initialValues: initial, validate: filterErrors });
  const { entityType, userId, action } = form.getValues();
  const allTypes = entityTypes.length === AUDIT_ENTITY_TYPES.length;
  const anyType = allTypes ? 'All types' : `Any: ${entityTypes.map((type) => ENTITY_TYPE_LABELS[type].toLowerCase()).join(', ')}`;

  const changeEntityType = (value: string | null) => {
    const next = isEntityType(entityTypes, value) ? value : null;
    form.setFieldValue('entityType', next);
    // An action about another kind of record would find nothing.
    if (next && action && actionEntityType(action) !== next) form.setFieldValue('action', null);
  };

  const clear = () => {
    form.setValues(EMPTY_FILTERS);
    form.clearErrors();
    onSearch(EMPTY_FILTERS);
  };

  return (
    <form
      onSubmit={form.onSubmit((values) => onSearch({ ...values, entityId: values.entityId.trim() }))}
      noValidate
      aria-label="Audit filters"
    >
      <SimpleGrid cols={{ base: 1, sm: 2, lg: 3 }} spacing="sm" verticalSpacing="sm">
        <Select
          label="Record type"
          placeholder={anyType}
          data={entityTypes.map((type) => ({ value: type, label: ENTITY_TYPE_LABELS[type] }))}
          value={entityType}
          onChange={changeEntityType}
          clearable
        />
        <TextInput
          label="Record number"
          description={
            allTypes ? 'An order number, or the ID of a library version, user or ward' : 'An order number, or the ID of a library version'
          }
          maxLength={40}
          {...form.getInputProps('entityId')}
        />
        {users ? (
          <Select
            label="Person"
            placeholder={usersLoading ? 'Loading people…' : 'Anyone'}
            data={users}
            value={userId === null ? null : String(userId)}
            onChange={(value) => form.setFieldValue('userId', value ? Number(value) : null)}
            searchable
            clearable
            nothingFoundMessage="Nobody by that name"
          />
        ) : null}
        <Select
          label="Action"
          placeholder="Any action"
          data={actionOptions(entityTypes, entityType)}
          value={action}
          onChange={(value) => form.setFieldValue('action', value)}
          searchable
          clearable
          nothingFoundMessage="No such action"
        />
        <TextInput type="datetime-local" label="From" description="Your local time" {...form.getInputProps('from')} />
        <TextInput
          type="datetime-local"
          label="To"
          description="Your local time, to the end of that minute"
          {...form.getInputProps('to')}
        />
      </SimpleGrid>
      <Group gap="sm" mt="md">
        <Button type="submit" leftSection={<IconSearch size={16} aria-hidden />}>
          Search
        </Button>
        <Button variant="default" leftSection={<IconFilterOff size={16} aria-hidden />} onClick={clear}>
          Clear filters
        </Button>
      </Group>
    </form>
  );
}
