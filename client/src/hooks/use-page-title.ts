import { useDocumentTitle } from '@mantine/hooks';

/** Sets the browser tab's title to "<screen> · Lockstep", so open tabs and history read clearly. */
export function usePageTitle(screen: string): void {
  useDocumentTitle(`${screen} · Lockstep`);
}
