import { Button } from '@mantine/core';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';

/** The way out once a bedside task is done: the ward's PCA orders. */
export function BackToOrdersButton({ wardId }: { wardId: number }) {
  return (
    <Button component={Link} to={paths.bedside.getHref({ wardId })} size="lg">
      Back to PCA orders
    </Button>
  );
}
