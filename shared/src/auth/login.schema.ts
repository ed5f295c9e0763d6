import { z } from 'zod';
import { atLeast, atMost, must } from '../api/request-rules.js';
import { roleSchema } from './roles.js';

export const loginSchema = z.strictObject({
  username: z
    .string(must('username is required', 'username must be text'))
    .trim()
    .refine(atLeast(1), 'Enter your username')
    .refine(atMost(64), 'Username is at most 64 characters'),
  password: z
    .string(must('password is required', 'password must be text'))
    .refine(atLeast(1), 'Enter your password')
    .refine(atMost(256), 'Password is at most 256 characters'),
});
export type LoginRequest = z.infer<typeof loginSchema>;

export const sessionUserSchema = z.object({
  id: z.number().int(),
  username: z.string(),
  displayName: z.string(),
  role: roleSchema,
});
export type SessionUser = z.infer<typeof sessionUserSchema>;

/** The signed-in person as the screens show them: who, and the wards they are assigned to. */
export const sessionProfileSchema = sessionUserSchema.extend({
  wards: z.array(z.object({ id: z.number().int(), name: z.string() })),
});
export type SessionProfile = z.infer<typeof sessionProfileSchema>;

export const loginResponseSchema = z.object({
  accessToken: z.string(),
  user: sessionProfileSchema,
});
export type LoginResponse = z.infer<typeof loginResponseSchema>;
