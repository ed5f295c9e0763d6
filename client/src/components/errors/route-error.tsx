import { Anchor, Container, Stack, Text, Title } from '@mantine/core';
import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { paths } from '@/config/paths';

/** Shown when a screen fails to load or throws (for example after a new release). */
export function RouteError() {
  const error = useRouteError();
  const notFound = isRouteErrorResponse(error) && error.status === 404;
  if (!notFound) console.error(error);
  return (
    <Container size="sm" py="xl">
      <Stack gap="sm">
        <Title order={1}>{notFound ? 'Page not found' : 'This screen could not be shown'}</Title>
        <Text>
          {notFound ? 'There is no page at this address.' : 'Reload the page. If it happens again, tell support what you were doing.'}
        </Text>
        <Anchor component={Link} to={paths.root.getHref()}>
          Go to your home screen
        </Anchor>
      </Stack>
    </Container>
  );
}
