import { useMemo, useState } from 'react';
import { Anchor, EmptyState } from '@mantine/core';
import { IconUserSearch } from '@tabler/icons-react';
import { createColumnHelper, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { Link } from 'react-router-dom';
import { ageInYears, type OrderListEntry, type Patient, patientDisplayName } from '@lockstep/shared';
import { OrderAlertBadges } from '@/components/ui/order-alert-badges';
import { DataTable } from '@/components/ui/data-table';
import { paths } from '@/config/paths';
import { formatWeight } from '../utils/patient-format';
import { RiskMarkers } from './risk-markers';

const column = createColumnHelper<Patient>();

const baseColumns = [
  column.accessor('bed', { header: 'Bed', sortingFn: 'alphanumeric' }),
  column.accessor((patient) => patientDisplayName(patient), {
    id: 'name',
    header: 'Name',
    cell: ({ row, getValue }) => (
      // The row itself takes keyboard focus; the link serves pointer and screen-reader users.
      <Anchor component={Link} to={paths.patient.getHref(row.original.id)} tabIndex={-1} fw={500} size="sm">
        {getValue()}
      </Anchor>
    ),
  }),
  column.accessor('mrn', { header: 'MRN' }),
  column.accessor((patient) => ageInYears(patient.dateOfBirth), { id: 'age', header: 'Age' }),
  column.accessor((patient) => patient.weightKg ?? undefined, {
    id: 'weight',
    header: 'Weight',
    sortUndefined: 'last',
    cell: ({ row }) => formatWeight(row.original.weightKg),
  }),
  column.accessor('wardName', { header: 'Ward' }),
  column.display({
    id: 'risks',
    header: 'Risk markers',
    cell: ({ row }) => <RiskMarkers patient={row.original} compact />,
  }),
];

/** With a PCA column: open urgent flags and overdue observations on the patient's running PCAs. */
function columnsWith(pcas: ReadonlyMap<number, OrderListEntry[]>, now: Date) {
  return [
    ...baseColumns,
    column.display({
      id: 'pca',
      header: 'PCA',
      cell: ({ row }) =>
        (pcas.get(row.original.id) ?? []).map((order) => (
          <OrderAlertBadges
            key={order.id}
            paused={order.paused}
            openUrgentFlags={order.openUrgentFlags}
            nextObservation={order.nextObservation}
            now={now}
          />
        )),
    }),
  ];
}

export interface PatientsTableProps {
  patients: Patient[];
  totalCount: number;
  isLoading: boolean;
  emptyMessage: string;
  onOpen: (patient: Patient) => void;
  /** Running PCAs by patient id, for the PCA alerts column; none shows no column. */
  pcas?: ReadonlyMap<number, OrderListEntry[]>;
  now?: Date;
}

export function PatientsTable({ patients, totalCount, isLoading, emptyMessage, onOpen, pcas, now }: PatientsTableProps) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'bed', desc: false }]);
  const columns = useMemo(() => (pcas && now ? columnsWith(pcas, now) : baseColumns), [pcas, now]);
  const table = useReactTable({
    data: patients,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: (patient) => String(patient.id),
  });
  const caption = useMemo(
    () => (isLoading ? undefined : `Showing ${patients.length} of ${totalCount} patients`),
    [isLoading, patients.length, totalCount],
  );

  return (
    <DataTable
      table={table}
      label="Patients"
      caption={caption}
      isLoading={isLoading}
      onRowOpen={onOpen}
      empty={<EmptyState size="sm" icon={<IconUserSearch aria-hidden />} title="No patients to show" description={emptyMessage} />}
    />
  );
}
