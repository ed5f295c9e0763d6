import { renderToStaticMarkup } from 'react-dom/server';
import { MantineProvider } from '@mantine/core';
import { describe, expect, it } from 'vitest';
import { PossibleTotals } from './possible-totals';

describe('PossibleTotals', () => {
  it('marks a total over a maximum with an icon, a word and a colour, not colour alone', () => {
    const html = renderToStaticMarkup(
      <MantineProvider>
        <PossibleTotals
          rows={[
            { window: 'anyHour', label: 'Any other hour', total: '20 mg', limit: 'soft 10 mg, hard 15 mg', status: 'over-hard' },
            { window: 'anyFourHours', label: 'Any other 4 hours', total: '24 mg', limit: 'soft 30 mg, hard 40 mg', status: 'within' },
          ]}
        />
      </MantineProvider>,
    );
    expect(html).toContain('20 mg');
    expect(html).toContain('soft 10 mg, hard 15 mg');
    expect(html).toContain('Over hard maximum');
    expect(html).toContain('Within');
    expect(html).toContain('data-status="over-hard"');
    expect(html.match(/<svg/g)?.length).toBe(2);
  });
});
