import type { Locator, Page } from 'playwright-core';

/**
 * The dialog once it is ready for typing. A Mantine modal fades in and then moves focus inside
 * (to its `data-autofocus` field, else the first control); typing before that can land while the
 * focus trap is still settling, and on a loaded machine the keystrokes were lost. So wait for focus.
 */
export async function readyDialog(page: Page, name?: string | RegExp): Promise<Locator> {
  const dialog = page.getByRole('dialog', name === undefined ? {} : { name });
  await dialog.waitFor();
  await dialog.evaluate(
    (element) =>
      new Promise<void>((resolve, reject) => {
        const deadline = Date.now() + 10_000;
        const check = () => {
          if (element.contains(document.activeElement)) resolve();
          else if (Date.now() > deadline) reject(new Error('Focus never moved into the dialog'));
          else setTimeout(check, 25);
        };
        check();
      }),
  );
  return dialog;
}
