import { useMemo } from 'react';
import { Stack, Title } from '@mantine/core';
import { useNavigate, useSearchParams } from 'react-router-dom';
import type { Ward } from '@lockstep/shared';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { paths } from '@/config/paths';
import { usePatients } from '@/api/patients/get-patients';
import { matchesPatientSearch } from '../utils/patient-format';
import { ALL_WARDS, PatientFilters } from './patient-filters';
import { PatientsTable } from './patients-table';
import { useOrders } from '@/api/orders/get-orders';
import { useNow } from '@/hooks/use-now';
import { ordersByPatient } from '@/utils/order-alerts';

export interface PatientsScreenProps {
  wards: Ward[];
  wardsLoading: boolean;
}

export function PatientsScreen({ wards, wardsLoading }: PatientsScreenProps) {
  const navigate = useNavigate();
  // Filters live in the address so "back" from a patient returns to the same list.
  const [searchParams, setSearchParams] = useSearchParams();
  const ward = searchParams.get('ward') ?? ALL_WARDS;
  const search = searchParams.get('q') ?? '';
  const wardId = ward === ALL_WARDS ? undefined : Number(ward);

  const patientsQuery = usePatients({ wardId: Number.isInteger(wardId) ? wardId : undefined });
  const allPatients = useMemo(() => patientsQuery.data ?? [], [patientsQuery.data]);
  const shown = useMemo(() => allPatients.filter((p) => matchesPatientSearch(p, search)), [allPatients, search]);
  // Running PCAs, for open urgent flags and overdue observations beside each patient.
  const runningQuery = useOrders({ status: ['active'] }, { staleTime: 0, refetchInterval: 60_000 });
  const pcas = useMemo(() => ordersByPatient(runningQuery.data ?? []), [runningQuery.data]);
  const now = useNow(30_000);

  const setParam = (key: string, value: string, empty: string) => {
    setSearchParams(
      (previous) => {
        const next = new URLSearchParams(previous);
        if (value === empty) next.delete(key);
        else next.set(key, value);
        return next;
      },
      { replace: true },
    );
  };

  const emptyMessage = search.trim()
    ? `No patient matches "${search.trim()}". Check the spelling or the MRN.`
    : 'There are no patients on this ward.';

  return (
    <Stack gap="md">
      <Title order={1}>Patients</Title>
      <PatientFilters
        wards={wards}
        wardsLoading={wardsLoading}
        ward={ward}
        search={search}
        onWardChange={(value) => setParam('ward', value, ALL_WARDS)}
        onSearchChange={(value) => setParam('q', value, '')}
      />
      {patientsQuery.isError ? (
        <QueryErrorAlert title="Patients could not be loaded" error={patientsQuery.error} onRetry={() => void patientsQuery.refetch()} />
      ) : (
        <PatientsTable
          pcas={pcas}
          now={now}
          patients={shown}
          totalCount={allPatients.length}
          isLoading={patientsQuery.isPending}
          emptyMessage={emptyMessage}
          onOpen={(patient) => navigate(paths.patient.getHref(patient.id))}
        />
      )}
    </Stack>
  );
}
