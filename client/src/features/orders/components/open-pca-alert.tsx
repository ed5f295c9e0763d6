import { Alert, Anchor, Text } from '@mantine/core';
import { IconCopyOff } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { duplicatePcaMessage, type OtherPcaOrder } from '@lockstep/shared';
import { paths } from '@/config/paths';

/** Duplicate therapy, said before signing: the same words the API's 409 uses, with a way to the open order. */
export function OpenPcaAlert({ open }: { open: OtherPcaOrder }) {
  return (
    <Alert color="red" variant="light" icon={<IconCopyOff aria-hidden />} title="Another PCA is open for this patient" role="alert">
      <Text size="sm">{duplicatePcaMessage(open)}.</Text>
      <Anchor component={Link} to={paths.order.getHref(open.id)} size="sm">
        Open order {open.id}
      </Anchor>
    </Alert>
  );
}
