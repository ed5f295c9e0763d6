import { readFileSync, writeFileSync } from 'node:fs';

const START = '<!-- bench:results:start -->';
const END = '<!-- bench:results:end -->';

/** Replaces what lies between the bench markers of the document with `markdown`. */
export function writeResults(file: string, markdown: string): void {
  const text = readFileSync(file, 'utf8');
  const start = text.indexOf(START);
  const end = text.indexOf(END);
  if (start < 0 || end < start) throw new Error(`${file} has no ${START} … ${END} section to write the results into`);
  writeFileSync(file, `${text.slice(0, start + START.length)}\n${markdown}\n${text.slice(end)}`);
}
