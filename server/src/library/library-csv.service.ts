import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { parse } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';
import type { DataSource } from 'typeorm';
import {
  checkCsvHeader,
  type CsvProblem,
  csvRowsFromRules,
  diffLibrary,
  type ImportPreview,
  type LibraryVersionDetail,
  type NamedRule,
  rulesFromCsvRecords,
  validateLimitRules,
} from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { fieldError, fieldErrors } from '../common/errors/field-error.js';
import { Drug } from '../drugs/entities/drug.entity.js';
import { Ward } from '../wards/entities/ward.entity.js';
import { LibraryVersion } from './entities/library-version.entity.js';
import { LibraryVersionsService } from './library-versions.service.js';
import { FILE_TOO_LARGE, MAX_LIBRARY_CSV_BYTES } from './library-csv-limit.js';
import { LibraryService } from './library.service.js';
import { toNamedRule } from './named-rule.js';

export type UploadedCsv = { originalname: string; mimetype: string; size: number; buffer: Buffer };

/** CSV in and out of the dose-limit library (format: docs/library-csv.md). */
@Injectable()
export class LibraryCsvService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly library: LibraryService,
    private readonly versions: LibraryVersionsService,
  ) {}

  /** Checks every row first; any problem is a 400 listing them all, and nothing is written. */
  async preview(wardId: number, file: UploadedCsv | undefined): Promise<ImportPreview> {
    if (!(await this.dataSource.manager.existsBy(Ward, { id: wardId }))) throw fieldError('wardId', `No ward with id ${wardId}`);
    const rules = await this.readRules(file);
    const active = await this.dataSource.manager.findOne(LibraryVersion, {
      where: { wardId, status: 'active' },
      relations: { rules: { drug: true } },
    });
    return { rules, diff: diffLibrary(active?.rules.map(toNamedRule) ?? [], rules) };
  }

  async import(wardId: number, file: UploadedCsv | undefined, note: string | undefined, author: AuthUser): Promise<LibraryVersionDetail> {
    const rules = await this.readRules(file);
    return this.versions.createDraft(wardId, note ?? `Imported from ${file?.originalname ?? 'CSV'}`, author, rules);
  }

  async export(id: number): Promise<{ filename: string; csv: string }> {
    const version = await this.library.getVersion(id);
    const csv = stringify(csvRowsFromRules(version.rules));
    return { filename: `dose-limits-${version.wardName.toLowerCase()}-v${version.number}.csv`, csv };
  }

  private async readRules(file: UploadedCsv | undefined): Promise<NamedRule[]> {
    const text = checkedText(file);
    let rows: string[][];
    try {
      rows = parse(text, { bom: true, trim: true, skip_empty_lines: true, relax_column_count: false });
    } catch (error) {
      const line = (error as { lines?: number }).lines;
      throw fileProblem(`The file could not be read as CSV${line ? ` (near line ${line})` : ''}: ${(error as Error).message}`);
    }
    if (rows.length < 2) throw fileProblem('The file has no rule rows under its header');
    const header = rows[0].map((column) => column.toLowerCase());
    const headerProblems = checkCsvHeader(header);
    if (headerProblems.length > 0) throw rowProblems(headerProblems);

    const records = rows.slice(1).map((cells) => Object.fromEntries(header.map((column, i) => [column, cells[i] ?? ''])));
    const drugs = await this.dataSource.manager.find(Drug);
    const { rules, problems } = rulesFromCsvRecords(records, drugs);
    if (problems.length > 0) throw rowProblems(problems);
    const ruleProblems = validateLimitRules(rules);
    if (ruleProblems.length > 0) throw fileProblem(ruleProblems.map((problem) => problem.message).join('; '));
    return rules;
  }
}

function checkedText(file: UploadedCsv | undefined): string {
  if (!file) throw fileProblem('Choose a CSV file to upload (form field "file")');
  if (file.size === 0) throw fileProblem('The file is empty');
  if (file.size > MAX_LIBRARY_CSV_BYTES) throw fileProblem(FILE_TOO_LARGE);
  const looksLikeCsv = /\.csv$/i.test(file.originalname) || /^text\/(csv|plain)$|^application\/vnd\.ms-excel$/.test(file.mimetype);
  if (!looksLikeCsv) throw fileProblem('Only CSV files (.csv) can be imported');
  if (file.buffer.includes(0)) throw fileProblem('The file is not text: save it as CSV (comma-separated values) and try again');
  const text = file.buffer.toString('utf8');
  if (text.includes('\uFFFD')) throw fileProblem('The file is not UTF-8 text: save it as CSV UTF-8 and try again');
  return text;
}

function fileProblem(message: string) {
  return fieldError('file', message);
}

// A file that is wrong throughout would otherwise answer megabytes of the same few mistakes.
const PROBLEMS_LISTED = 200;

function rowProblems(problems: CsvProblem[]) {
  const rows = new Set(problems.map((problem) => problem.row)).size;
  const more = problems.length - PROBLEMS_LISTED;
  return fieldErrors(
    `The file has ${problems.length} problem${problems.length === 1 ? '' : 's'} in ${rows} row${rows === 1 ? '' : 's'}; nothing was imported` +
      (more > 0 ? ` (the first ${PROBLEMS_LISTED} are listed)` : ''),
    problems
      .slice(0, PROBLEMS_LISTED)
      .map(({ row, column, message }) => ({ field: 'file', row, column, message: `Row ${row}, ${column}: ${message}` })),
  );
}
