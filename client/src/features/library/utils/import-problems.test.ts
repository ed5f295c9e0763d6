import { describe, expect, it } from 'vitest';
import { formatFileSize, importProblemRows, rejectionMessage } from './import-problems';

describe('importProblemRows', () => {
  it('keeps row and column apart from the message, in row order', () => {
    expect(
      importProblemRows([
        {
          field: 'file',
          row: 5,
          column: 'hard_max',
          message: 'Row 5, hard_max: demand_dose: the hard maximum (1) is below the soft maximum (2)',
        },
        { field: 'file', row: 3, column: 'drug', message: 'Row 3, drug: Unknown drug morfine; known: morphine, hydromorphone, fentanyl' },
      ]),
    ).toEqual([
      { key: '1', row: 3, column: 'drug', message: 'Unknown drug morfine; known: morphine, hydromorphone, fentanyl' },
      { key: '0', row: 5, column: 'hard_max', message: 'demand_dose: the hard maximum (1) is below the soft maximum (2)' },
    ]);
  });

  it('keeps a whole-file problem as it is', () => {
    expect(importProblemRows([{ field: 'file', message: 'The file is empty' }])).toEqual([
      { key: '0', row: null, column: null, message: 'The file is empty' },
    ]);
  });
});

describe('rejectionMessage', () => {
  it('says why a dropped file was refused', () => {
    expect(rejectionMessage('limits.xlsx', 2000, ['file-invalid-type'])).toBe(
      'limits.xlsx is not a CSV file. Choose a .csv file (comma-separated values).',
    );
    expect(rejectionMessage('big.csv', 3 * 1024 * 1024, ['file-too-large'])).toBe('big.csv is 3.0 MB; a library CSV can be at most 1 MB.');
    expect(rejectionMessage('a.csv', 10, ['too-many-files'])).toBe('Drop one file at a time.');
  });

  it('writes file sizes plainly', () => {
    expect(formatFileSize(512)).toBe('512 bytes');
    expect(formatFileSize(2048)).toBe('2 KB');
  });
});
