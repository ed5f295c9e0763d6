import { PatientsScreen } from '@/features/patients/components/patients-screen';
import { useWards } from '@/api/wards/get-wards';
import { usePageTitle } from '@/hooks/use-page-title';

export function Component() {
  usePageTitle('Patients');
  const wards = useWards();
  return <PatientsScreen wards={wards.data ?? []} wardsLoading={wards.isPending} />;
}
