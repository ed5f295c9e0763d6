import { Button } from '@mantine/core';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useCurrentUser } from '@/lib/auth/use-session';
import { bedsideListWard } from '../utils/ward-choice';

/** The way out once a bedside task is done: the nurse's PCA orders (her own wards, or the order's ward if not one of hers). */
export function BackToOrdersButton({ wardId }: { wardId: number }) {
  const user = useCurrentUser();
  const listWard = bedsideListWard(
    wardId,
    user.wards.map((ward) => ward.id),
  );
  return (
    <Button component={Link} to={paths.bedside.getHref({ wardId: listWard })} size="lg">
      Back to PCA orders
    </Button>
  );
}
