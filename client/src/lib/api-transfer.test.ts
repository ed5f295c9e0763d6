import { describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { filenameFromDisposition, readUploadAnswer } from './api-transfer';

describe('filenameFromDisposition', () => {
  it('reads the quoted, plain and UTF-8 forms', () => {
    expect(filenameFromDisposition('attachment; filename="dose-limits-cedar-v2.csv"', 'x.csv')).toBe('dose-limits-cedar-v2.csv');
    expect(filenameFromDisposition('attachment; filename=limits.csv', 'x.csv')).toBe('limits.csv');
    expect(filenameFromDisposition("attachment; filename*=UTF-8''caf%C3%A9.csv", 'x.csv')).toBe('café.csv');
  });

  it('falls back when there is no usable name, and never keeps a folder', () => {
    expect(filenameFromDisposition(null, 'x.csv')).toBe('x.csv');
    expect(filenameFromDisposition('attachment', 'x.csv')).toBe('x.csv');
    expect(filenameFromDisposition('attachment; filename="../../etc/limits.csv"', 'x.csv')).toBe('limits.csv');
  });
});

describe('readUploadAnswer', () => {
  const schema = z.object({ id: z.number() });

  it('returns the checked body of a success', () => {
    expect(readUploadAnswer(201, '{"id":4,"extra":true}', schema, vi.fn())).toEqual({ id: 4 });
  });

  it('throws the API error of a failure with every field error', () => {
    const body = {
      statusCode: 400,
      message: 'The file has 1 problem in 1 row; nothing was imported',
      errors: [{ field: 'file', row: 3, column: 'drug', message: 'Row 3, drug: Unknown drug morfine' }],
    };
    expect(() => readUploadAnswer(400, JSON.stringify(body), schema, vi.fn())).toThrow(
      expect.objectContaining({ status: 400, errors: body.errors }),
    );
  });

  it('ends the session on a 401 and reports an unreadable success', () => {
    const onUnauthorized = vi.fn();
    expect(() => readUploadAnswer(401, '', schema, onUnauthorized)).toThrow(expect.objectContaining({ status: 401 }));
    expect(onUnauthorized).toHaveBeenCalledOnce();
    expect(() => readUploadAnswer(200, '<html>', schema, vi.fn())).toThrow(expect.objectContaining({ status: 0 }));
  });
});
