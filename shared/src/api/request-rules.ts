import { z } from 'zod';

// Building blocks for the request schemas, each the zod twin of a class-validator rule the server's
// DTOs use, so that a schema accepts and refuses what the DTO does and says it in the same words.

type RawIssue = { code?: string; input?: unknown };

/**
 * The message before any check: @IsDefined's when the value is missing or null, the type check's
 * (@IsString, @IsNumber, @IsIn, @IsObject…) when it is there but of the wrong kind. An unknown key
 * keeps zod's own issue; `requestFieldErrors` names it as the server does.
 */
export function must(required: string, wrongType: string = required) {
  return {
    error: (issue: RawIssue) =>
      issue.code === 'unrecognized_keys' ? undefined : issue.input === undefined || issue.input === null ? required : wrongType,
  };
}

/** Length as @MinLength and @MaxLength count it (validator.js isLength): an emoji, or a character and its variation selector, is one. */
export function textLength(text: string): number {
  const presentations = text.match(/[^\uFE0F\uFE0E][\uFE0F\uFE0E]/g)?.length ?? 0;
  const surrogatePairs = text.match(/[\uD800-\uDBFF][\uDC00-\uDFFF]/g)?.length ?? 0;
  return text.length - presentations - surrogatePairs;
}

export const atLeast =
  (min: number) =>
  (text: string): boolean =>
    textLength(text) >= min;
export const atMost =
  (max: number) =>
  (text: string): boolean =>
    textLength(text) <= max;

/** @IsInt: any whole number (zod's .int() also refuses those beyond 2^53, which the server takes). */
export const isWhole = (value: number): boolean => Number.isInteger(value);

/** A rule that class-validator applies to each item of a list (`each: true`), with its message. */
export type EachRule = readonly [test: (item: unknown) => boolean, message: string];

/** @IsObject: an object that is not a list. */
export const isPlainObject = (item: unknown): boolean => typeof item === 'object' && item !== null && !Array.isArray(item);

type ListMessages = { required: string; type: string; max: readonly [count: number, message: string] };

/**
 * A list as class-validator checks one: present, a list (@IsArray), not too long (@ArrayMaxSize),
 * then each `each: true` rule over every item before the next rule, all named by the list; the
 * items' own fields (@ValidateNested) only once all of that holds.
 */
export function listOf<T extends z.ZodType>(item: T, { required, type, max }: ListMessages, each: readonly EachRule[] = []) {
  return z
    .array(z.unknown(), must(required, type))
    .max(max[0], max[1])
    .superRefine((items, ctx) => {
      const broken = each.find(([test]) => !items.every(test));
      if (broken) ctx.addIssue({ code: 'custom', message: broken[1], input: items });
    })
    .pipe(z.array(item));
}
