// FDA and ISMP Lists of Look-Alike Drug Names with Recommended Tall Man Letters, ISMP 2023.
// Morphine is listed as the look-alike of HYDROmorphone but itself gets no tall-man letters.
const TALL_MAN_NAMES: Readonly<Record<string, string>> = {
  hydromorphone: 'HYDROmorphone',
  morphine: 'morphine',
  hydrocodone: 'HYDROcodone',
  oxycodone: 'oxyCODONE',
  fentanyl: 'fentaNYL',
  sufentanil: 'SUFentanil',
};

const LISTED_NAME = new RegExp(`\\b(${Object.keys(TALL_MAN_NAMES).join('|')})\\b`, 'gi');

/**
 * `drugName` with tall-man lettering wherever a word is on the published list, whatever case it
 * was typed in ('Hydromorphone HCl' → 'HYDROmorphone HCl'). Words not on the list are returned
 * exactly as given.
 */
export function tallMan(drugName: string): string {
  return drugName.replace(LISTED_NAME, (word) => TALL_MAN_NAMES[word.toLowerCase()] ?? word);
}
