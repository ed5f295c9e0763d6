import { z } from 'zod';
import { atLeast, atMost, isWhole, listOf, must } from '../api/request-rules.js';
import { ROLES, roleSchema } from '../auth/roles.js';

export const PASSWORD_MIN_LENGTH = 12;

const password = z
  .string(must('password is required', 'password must be text'))
  .refine(atLeast(PASSWORD_MIN_LENGTH), `Password must be at least ${PASSWORD_MIN_LENGTH} characters`)
  .refine(atMost(256), 'Password is at most 256 characters');

/** Never trimmed: a username with a space in it is refused, not tidied. */
export const usernameSchema = z
  .string(must('username is required', 'username must be text'))
  .refine(atLeast(3), 'Username must be at least 3 characters')
  .refine(atMost(64), 'Username is at most 64 characters')
  .regex(/^[a-z0-9._-]+$/, 'Username may use lower-case letters, digits, dots, dashes and underscores');

const isPositive = (id: unknown) => typeof id === 'number' && id > 0;

export const createUserSchema = z.strictObject({
  username: usernameSchema,
  displayName: z
    .string(must('displayName is required', 'displayName must be text'))
    .trim()
    .refine(atLeast(1), 'Enter a display name')
    .refine(atMost(120), 'Display name is at most 120 characters'),
  role: z.enum(ROLES, must('role is required', `role must be one of: ${ROLES.join(', ')}`)),
  wardIds: listOf(
    z.number(),
    {
      required: 'wardIds is required (an empty list is allowed)',
      type: 'wardIds must be a list of ward ids',
      max: [100, 'wardIds lists at most 100 wards'],
    },
    [
      [(id) => typeof id === 'number' && isWhole(id), 'each ward id must be a whole number'],
      [isPositive, 'each ward id must be positive'],
    ],
  ),
  password,
});
export type CreateUserRequest = z.infer<typeof createUserSchema>;

/** Every field may be left out; a null is refused, never taken to blank a field. */
export const updateUserSchema = z.strictObject({
  displayName: createUserSchema.shape.displayName.optional(),
  role: createUserSchema.shape.role.optional(),
  wardIds: createUserSchema.shape.wardIds.optional(),
  active: z.boolean('active must be true or false').optional(),
  password: password.optional(),
});
export type UpdateUserRequest = z.infer<typeof updateUserSchema>;

export const userSchema = z.object({
  id: z.number().int(),
  username: z.string(),
  displayName: z.string(),
  role: roleSchema,
  active: z.boolean(),
  wardIds: z.array(z.number().int()),
  createdAt: z.string(),
});
export type User = z.infer<typeof userSchema>;
