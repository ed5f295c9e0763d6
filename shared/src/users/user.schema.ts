import { z } from 'zod';
import { roleSchema } from '../auth/roles.js';

export const PASSWORD_MIN_LENGTH = 12;

const password = z
  .string()
  .min(PASSWORD_MIN_LENGTH, `Password must be at least ${PASSWORD_MIN_LENGTH} characters`)
  .max(256, 'Password is at most 256 characters');

export const usernameSchema = z
  .string()
  .trim()
  .min(3, 'Username must be at least 3 characters')
  .max(64, 'Username is at most 64 characters')
  .regex(/^[a-z0-9._-]+$/, 'Username may use lower-case letters, digits, dots, dashes and underscores');

export const createUserSchema = z.object({
  username: usernameSchema,
  displayName: z.string().trim().min(1, 'Enter a display name').max(120, 'Display name is at most 120 characters'),
  role: roleSchema,
  wardIds: z.array(z.number().int().positive()).max(100),
  password,
});
export type CreateUserRequest = z.infer<typeof createUserSchema>;

export const updateUserSchema = z.object({
  displayName: createUserSchema.shape.displayName.optional(),
  role: roleSchema.optional(),
  wardIds: createUserSchema.shape.wardIds.optional(),
  active: z.boolean().optional(),
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
