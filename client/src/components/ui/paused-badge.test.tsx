import { renderToStaticMarkup } from 'react-dom/server';
import { MantineProvider } from '@mantine/core';
import { describe, expect, it } from 'vitest';
import { PausedBadge } from './paused-badge';

describe('PausedBadge', () => {
  it('says "Paused" in words beside its icon, never by colour alone', () => {
    const html = renderToStaticMarkup(
      <MantineProvider>
        <PausedBadge />
      </MantineProvider>,
    );
    expect(html).toContain('Paused');
    expect(html).toContain('<svg');
  });
});
