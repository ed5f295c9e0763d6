import 'reflect-metadata';
import fc from 'fast-check';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { dotted, related } from './support/bad-bodies.js';
import { INJECTION_STRINGS } from './support/bad-values.js';
import { BAD_BODIES_PER_ROUTE, prototypeIsClean, rowCounts, settledRowCounts } from './support/bad-input-runner.js';
import { type HttpClient, listen, type Reply } from './support/http-client.js';
import { createTestApp, DEMO_USER_BY_ROLE, type TestApp } from './support/test-app.js';

// POST /api/library/import (docs/library-csv.md): multipart with `file`, `wardId`, optional `note`
// and `dryRun`. library.e2e-spec.ts already refuses an empty file, a binary one, a non-CSV name,
// wrong columns (drug,dose) and a file just over 1 MB; this file covers the rest.
const CEDAR = '2';
const MAX_BYTES = 1024 * 1024;
const HEADER = 'drug,concentration_per_ml,dose_unit,per_kg,parameter,hard_min,soft_min,soft_max,hard_max';
const ROW = 'morphine,1,mg,no,demand_dose,0.2,0.5,1.8,3';
const GOOD_CSV = `${HEADER}\n${ROW}\nmorphine,1,mg,no,lockout_minutes,5,6,15,30\n`;

type FormFields = Record<string, string | string[]>;
type Upload = { fields: FormFields; files?: { field: string; content: string | Uint8Array; name: string; type?: string }[] };

function formOf({ fields, files = [{ field: 'file', content: GOOD_CSV, name: 'limits.csv' }] }: Upload): FormData {
  const form = new FormData();
  for (const [name, value] of Object.entries(fields)) for (const one of [value].flat()) form.append(name, one);
  for (const file of files) form.append(file.field, new Blob([file.content], { type: file.type ?? 'text/csv' }), file.name);
  return form;
}

// Multipart text fields are always strings: bad values are strings the DTO refuses.
const isPositiveWhole = (text: string) => Number.isInteger(Number(text)) && Number(text) > 0;
const anyText = fc.oneof(
  fc.string({ maxLength: 30 }),
  fc.constantFrom(...INJECTION_STRINGS),
  fc.constantFrom('', '0', '-1', '1.5', 'NaN', 'Infinity', '1e999', '2; DROP TABLE library_versions', '9'.repeat(400)),
);
const FORM_FIELDS = ['wardId', 'note', 'dryRun'];
const PROTOTYPE_NAMES = new Set([...Object.getOwnPropertyNames(Object.prototype), '__proto__', 'prototype']);

type FormMutation = { kind: string; field: string; value?: string | string[]; remove?: true };
const formMutation: fc.Arbitrary<FormMutation> = fc.oneof(
  fc.constant<FormMutation>({ kind: 'missing', field: 'wardId', remove: true }),
  anyText.filter((text) => !isPositiveWhole(text)).map((value) => ({ kind: 'bad number', field: 'wardId', value })),
  fc.constant<FormMutation>({ kind: 'repeated', field: 'wardId', value: [CEDAR, '3'] }),
  fc
    .string({ minLength: 1001, maxLength: 3000 })
    .filter((text) => text.length > 1000)
    .map((value) => ({ kind: 'long string', field: 'note', value })),
  anyText.filter((text) => text !== 'true' && text !== 'false').map((value) => ({ kind: 'not a boolean', field: 'dryRun', value })),
  fc
    .tuple(fc.stringMatching(/^[A-Za-z_$][A-Za-z0-9_$-]{0,15}$/), anyText)
    .filter(([name]) => !FORM_FIELDS.includes(name) && name !== 'file' && !PROTOTYPE_NAMES.has(name))
    .map(([field, value]) => ({ kind: 'unknown field', field, value })),
);

/** A valid import of a real draft (not a dry run), broken in one to three fields: any accepted one would write. */
const badImportForm = fc.array(formMutation, { minLength: 1, maxLength: 3 }).map((mutations) => {
  const fields: FormFields = { wardId: CEDAR, note: 'Imported limits', dryRun: 'false' };
  const broken: string[] = [];
  const kinds: string[] = [];
  for (const mutation of mutations) {
    if (broken.includes(mutation.field)) continue;
    if (mutation.remove) delete fields[mutation.field];
    else fields[mutation.field] = mutation.value!;
    broken.push(mutation.field);
    kinds.push(mutation.kind);
  }
  return { fields, broken, kinds, [fc.toStringMethod]: () => `${kinds.join(' + ')}: ${JSON.stringify(fields).slice(0, 400)}` };
});

describe('bad input: library CSV import', () => {
  let t: TestApp;
  let api: HttpClient;
  let dataSource: DataSource;
  let token: string;
  const sent: Record<string, number> = {};
  const statuses: Record<number, number> = {};

  const upload = async (label: string, request: Upload): Promise<Reply> => {
    const reply = await api.call('POST', '/api/library/import', { token, form: formOf(request) });
    sent[label] = (sent[label] ?? 0) + 1;
    statuses[reply.status] = (statuses[reply.status] ?? 0) + 1;
    return reply;
  };

  beforeAll(async () => {
    t = await createTestApp();
    api = await listen(t);
    dataSource = t.app.get(DataSource);
    token = await t.tokenFor(DEMO_USER_BY_ROLE.pharmacist);
  });
  afterAll(async () => {
    const total = Object.values(sent).reduce((sum, n) => sum + n, 0);
    const errors5xx = Object.entries(statuses)
      .filter(([status]) => Number(status) >= 500)
      .reduce((sum, [, n]) => sum + n, 0);
    console.log(
      `bad-input-uploads: ${total} bad uploads, ${errors5xx} server errors; statuses ${JSON.stringify(statuses)}\n${Object.entries(sent)
        .map(([label, n]) => `  ${label}: ${n}`)
        .join('\n')}`,
    );
    await t.close();
  });

  it('generated bad form fields are all 400 naming the broken fields, and nothing is written', { timeout: 300_000 }, async () => {
    const before = await settledRowCounts(dataSource);
    await fc.assert(
      fc.asyncProperty(badImportForm, async (bad) => {
        const reply = await upload('bad form fields', { fields: bad.fields });
        const body = reply.body as { statusCode?: number; message?: string; errors?: { field: string; message: string }[] };
        const context = `${bad.kinds.join(', ')}: ${JSON.stringify(bad.fields).slice(0, 300)} → ${reply.status} ${reply.text.slice(0, 300)}`;
        expect(reply.status, context).toBe(400);
        expect(body.statusCode, context).toBe(400);
        expect(typeof body.message, context).toBe('string');
        const fields = (body.errors ?? []).map((error) => error.field);
        expect(
          bad.broken.filter((broken) => !fields.some((field) => related(field, broken))),
          context,
        ).toEqual([]);
        expect(
          fields.filter((field) => !bad.broken.some((broken) => related(field, dotted([broken])))),
          context,
        ).toEqual([]);
      }),
      { numRuns: BAD_BODIES_PER_ROUTE },
    );
    expect(await rowCounts(dataSource)).toEqual(before);
    expect(prototypeIsClean()).toBe(true);
  });

  const bigCsv = (bytes: number) => `${HEADER}\n${ROW}\n`.padEnd(bytes, '\n');
  const FILE_CASES: [string, Upload, string][] = [
    ['no file', { fields: { wardId: CEDAR }, files: [] }, 'Choose a CSV file to upload'],
    [
      'a header and no rows',
      { fields: { wardId: CEDAR }, files: [{ field: 'file', content: `${HEADER}\n`, name: 'limits.csv' }] },
      'no rule rows',
    ],
    [
      'a column missing',
      {
        fields: { wardId: CEDAR },
        files: [{ field: 'file', content: `${HEADER.replace(',hard_max', '')}\n${ROW.replace(/,3$/, '')}`, name: 'limits.csv' }],
      },
      'The file has',
    ],
    [
      'an unknown column',
      { fields: { wardId: CEDAR }, files: [{ field: 'file', content: `${HEADER},max_rate\n${ROW},2`, name: 'limits.csv' }] },
      'The file has',
    ],
    [
      'columns in a header-less file',
      { fields: { wardId: CEDAR }, files: [{ field: 'file', content: `${ROW}\n${ROW}`, name: 'limits.csv' }] },
      'The file has',
    ],
    [
      'a row with too few cells',
      { fields: { wardId: CEDAR }, files: [{ field: 'file', content: `${HEADER}\nmorphine,1,mg`, name: 'limits.csv' }] },
      'could not be read as CSV',
    ],
    [
      'an unclosed quote',
      {
        fields: { wardId: CEDAR },
        files: [{ field: 'file', content: `${HEADER}\n"morphine,1,mg,no,demand_dose,0.2,0.5,1.8,3`, name: 'limits.csv' }],
      },
      'could not be read as CSV',
    ],
    [
      'Latin-1 text',
      {
        fields: { wardId: CEDAR },
        files: [
          {
            field: 'file',
            content: new Uint8Array([...Buffer.from(`${HEADER}\nmorphin`), 0xe9, ...Buffer.from(',1,mg,no,demand_dose,0.2,0.5,1.8,3')]),
            name: 'limits.csv',
          },
        ],
      },
      'not UTF-8',
    ],
    [
      'a PNG named .csv',
      {
        fields: { wardId: CEDAR },
        files: [
          {
            field: 'file',
            content: new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0xff, 0xd8]),
            name: 'limits.csv',
            type: 'image/png',
          },
        ],
      },
      'not UTF-8',
    ],
    [
      'spreadsheet formulas in the cells',
      {
        fields: { wardId: CEDAR },
        files: [{ field: 'file', content: `${HEADER}\n=cmd|' /C calc'!A0,1,mg,no,demand_dose,0.2,0.5,1.8,3`, name: 'limits.csv' }],
      },
      'The file has 1 problem',
    ],
    [
      'SQL in the cells',
      {
        fields: { wardId: CEDAR },
        files: [
          {
            field: 'file',
            content: `${HEADER}\nmorphine'; DROP TABLE limit_rules; --,1,mg,no,demand_dose,0.2,0.5,1.8,3`,
            name: 'limits.csv',
          },
        ],
      },
      'The file has 1 problem',
    ],
    [
      'a 5 MB file',
      { fields: { wardId: CEDAR }, files: [{ field: 'file', content: bigCsv(5 * MAX_BYTES), name: 'limits.csv' }] },
      'over 1 MB',
    ],
    [
      'two files',
      {
        fields: { wardId: CEDAR },
        files: [
          { field: 'file', content: GOOD_CSV, name: 'a.csv' },
          { field: 'file', content: GOOD_CSV, name: 'b.csv' },
        ],
      },
      'Too many files',
    ],
    [
      'the file under another name',
      { fields: { wardId: CEDAR }, files: [{ field: 'upload', content: GOOD_CSV, name: 'limits.csv' }] },
      'Unexpected file field',
    ],
  ];

  it.each(FILE_CASES)('refuses %s with a clear 400, and writes nothing', async (label, request, message) => {
    const before = await settledRowCounts(dataSource);
    const reply = await upload(label, request);
    expect(reply.status, reply.text.slice(0, 300)).toBe(400);
    expect((reply.body as { message: string }).message).toContain(message);
    expect(await rowCounts(dataSource)).toEqual(before);
  });

  it('takes a file of exactly 1 MB (dry run) and refuses one byte more', async () => {
    const fits = await api.call('POST', '/api/library/import', {
      token,
      form: formOf({
        fields: { wardId: CEDAR, dryRun: 'true' },
        files: [{ field: 'file', content: bigCsv(MAX_BYTES), name: 'limits.csv' }],
      }),
    });
    expect(fits.status, fits.text.slice(0, 300)).toBe(200);
    const over = await upload('1 MB and one byte', {
      fields: { wardId: CEDAR, dryRun: 'true' },
      files: [{ field: 'file', content: bigCsv(MAX_BYTES + 1), name: 'limits.csv' }],
    });
    expect(over.status).toBe(400);
    expect((over.body as { message: string }).message).toContain('over 1 MB');
  });

  it('refuses random bytes as the file: always a 400 about the file, never a 500', { timeout: 120_000 }, async () => {
    const before = await settledRowCounts(dataSource);
    const randomFile = fc.oneof(
      fc.uint8Array({ minLength: 1, maxLength: 4096 }),
      fc.string({ unit: 'binary', minLength: 1, maxLength: 2000 }),
      fc
        .array(fc.array(fc.string({ maxLength: 12 }), { minLength: 1, maxLength: 10 }), { minLength: 1, maxLength: 20 })
        .map((rows) => rows.map((cells) => cells.join(',')).join('\n')),
    );
    await fc.assert(
      fc.asyncProperty(randomFile, async (content) => {
        const reply = await upload('random file content', {
          fields: { wardId: CEDAR },
          files: [{ field: 'file', content, name: 'limits.csv' }],
        });
        expect(reply.status, reply.text.slice(0, 300)).toBe(400);
        const body = reply.body as { message: string; errors: { field: string }[] };
        expect(body.message.length).toBeGreaterThan(0);
        expect(body.errors.every((error) => error.field === 'file')).toBe(true);
      }),
      { numRuns: 200 },
    );
    expect(await rowCounts(dataSource)).toEqual(before);
  });
});
