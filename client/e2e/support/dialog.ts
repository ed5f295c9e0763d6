import type { Locator, Page } from 'playwright-core';

/**
 * The dialog once it is ready for typing. A Mantine modal fades in and then moves focus inside
 * (to its `data-autofocus` field, else the first control); typing before that can land while the
 * focus trap is still settling, and on a loaded machine the keystrokes were lost. Ready means
 * focus is inside, or (for a dialog already open, whose focused button a request disabled) its
 * transitions have ended and the trap has had a moment more.
 */
export async function readyDialog(page: Page, name?: string | RegExp): Promise<Locator> {
  const dialog = page.getByRole('dialog', name === undefined ? {} : { name });
  await dialog.waitFor();
  await dialog.evaluate(
    (element) =>
      new Promise<void>((resolve, reject) => {
        const started = Date.now();
        let stillSince: number | null = null;
        const check = () => {
          if (element.contains(document.activeElement)) return resolve();
          const moving = element.getAnimations({ subtree: true }).some((animation) => animation.playState === 'running');
          stillSince = moving ? null : (stillSince ?? Date.now());
          if (stillSince !== null && Date.now() - stillSince >= 300) return resolve();
          if (Date.now() - started > 10_000) return reject(new Error('The dialog never settled'));
          setTimeout(check, 25);
        };
        check();
      }),
  );
  return dialog;
}
