import { renderToStaticMarkup } from 'react-dom/server';
import { MantineProvider } from '@mantine/core';
import { describe, expect, it } from 'vitest';
import type { Ward } from '@lockstep/shared';
import { ALL_WARDS, type WardChoice } from '../utils/ward-choice';
import { WardChoiceFilter } from './ward-choice-filter';

const WARDS = [
  { id: 1, name: 'Harbour' },
  { id: 2, name: 'Cedar' },
  { id: 4, name: 'Summit' },
] as unknown as Ward[];

function render(choice: WardChoice, ownWardIds: readonly number[]): string {
  return renderToStaticMarkup(
    <MantineProvider>
      <WardChoiceFilter wards={WARDS} wardsLoading={false} choice={choice} ownWardIds={ownWardIds} onChange={() => undefined} />
    </MantineProvider>,
  );
}

const buttons = (html: string) => [...html.matchAll(/<button[^>]*>(?:(?!<\/button>).)*?>(My wards|All wards)</g)].map((match) => match[1]);

describe('WardChoiceFilter', () => {
  it("on the nurse's own wards: offers every ward, not her own again", () => {
    const html = render([1, 4], [4, 1]);
    expect(html).toContain('Wards');
    // Her wards stand as chosen in the field.
    expect(html).toMatch(/Harbour[\s\S]*Summit/);
    expect(buttons(html)).toEqual(['All wards']);
  });

  it('on every ward: says so in the field and offers her own wards', () => {
    const html = render(ALL_WARDS, [1, 4]);
    expect(html).toContain('placeholder="All wards"');
    expect(html).not.toContain('Harbour');
    expect(buttons(html)).toEqual(['My wards']);
  });

  it('on another ward: offers both; with no ward of her own, only every ward', () => {
    expect(buttons(render([2], [1, 4]))).toEqual(['My wards', 'All wards']);
    expect(buttons(render([2], []))).toEqual(['All wards']);
  });
});
