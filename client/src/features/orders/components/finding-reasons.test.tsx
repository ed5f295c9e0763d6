import { renderToStaticMarkup } from 'react-dom/server';
import { MantineProvider } from '@mantine/core';
import { useForm } from '@mantine/form';
import { describe, expect, it } from 'vitest';
import type { Finding } from '@lockstep/shared';
import { emptyOrderForm } from '../utils/order-form';
import { FindingReasons } from './finding-reasons';

function Harness({ findings }: { findings: Finding[] }) {
  const form = useForm({ initialValues: emptyOrderForm(new Date(2026, 2, 5)) });
  return <FindingReasons form={form} findings={findings} />;
}
const render = (findings: Finding[]) =>
  renderToStaticMarkup(
    <MantineProvider>
      <Harness findings={findings} />
    </MantineProvider>,
  );

describe('FindingReasons', () => {
  it('shows a recorded allergy finding with what it means and asks a reason for it', () => {
    const html = render([
      {
        field: 'drugId',
        severity: 'soft',
        code: 'allergy.intolerance',
        message: 'Recorded morphine (intolerance; reaction: itch): give a reason to order this drug',
      },
    ]);
    expect(html).toContain('Reasons needed');
    expect(html).toContain('needs a reason');
    expect(html).toContain('reaction: itch');
    expect(html).toContain('Reason to order this drug for this patient');
    expect(html).toContain('<textarea');
  });

  it('shows nothing without such findings', () => {
    expect(render([])).not.toContain('Reasons needed');
  });
});
