import { Center, Loader } from '@mantine/core';

/** Shown while a screen's code loads. */
export function PageLoader() {
  return (
    <Center h="60vh" aria-live="polite">
      <Loader size="md" aria-label="Loading" />
    </Center>
  );
}
