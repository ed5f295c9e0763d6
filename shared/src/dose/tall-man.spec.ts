import { describe, expect, it } from 'vitest';
import { tallMan } from './tall-man.js';

// FDA and ISMP Lists of Look-Alike Drug Names with Recommended Tall Man Letters, ISMP 2023.
describe('tallMan', () => {
  it('letters the listed opioids', () => {
    expect(tallMan('hydromorphone')).toBe('HYDROmorphone');
    expect(tallMan('hydrocodone')).toBe('HYDROcodone');
    expect(tallMan('oxycodone')).toBe('oxyCODONE');
    expect(tallMan('fentanyl')).toBe('fentaNYL');
    expect(tallMan('sufentanil')).toBe('SUFentanil');
  });

  it('leaves morphine, the look-alike of HYDROmorphone, in lower case', () => {
    expect(tallMan('morphine')).toBe('morphine');
    expect(tallMan('MORPHINE')).toBe('morphine');
  });

  it('ignores the case it is given', () => {
    expect(tallMan('HYDROMORPHONE')).toBe('HYDROmorphone');
    expect(tallMan('Fentanyl')).toBe('fentaNYL');
    expect(tallMan('fentaNYL')).toBe('fentaNYL');
  });

  it('letters the drug word inside a longer name and keeps the rest', () => {
    expect(tallMan('Hydromorphone HCl')).toBe('HYDROmorphone HCl');
    expect(tallMan('fentanyl citrate')).toBe('fentaNYL citrate');
  });

  it('returns names that are not on the list unchanged', () => {
    expect(tallMan('ketamine')).toBe('ketamine');
    expect(tallMan('Remifentanil')).toBe('Remifentanil'); // whole words only
    expect(tallMan('')).toBe('');
  });
});
