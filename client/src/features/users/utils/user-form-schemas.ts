import { z } from 'zod';
import { createUserSchema, ROLES, type Role, type UpdateUserRequest, type User } from '@lockstep/shared';

// The forms use the shared rules; only the "nothing chosen yet" and "leave blank" states differ.
export const createUserFormSchema = createUserSchema.extend({
  role: z.enum(ROLES, { error: 'Choose a role' }),
});

// A type alias, not an interface: the form resolver takes values as a string-keyed record.
export type CreateUserFormValues = {
  username: string;
  displayName: string;
  role: Role | null;
  wardIds: number[];
  password: string;
};

export const emptyCreateUserForm: CreateUserFormValues = {
  username: '',
  displayName: '',
  role: null,
  wardIds: [],
  password: '',
};

const passwordRule = createUserSchema.shape.password;

export const editUserFormSchema = z.object({
  displayName: createUserSchema.shape.displayName,
  role: z.enum(ROLES, { error: 'Choose a role' }),
  wardIds: createUserSchema.shape.wardIds,
  // Blank keeps the current password; anything typed must meet the password rules.
  password: z.string().superRefine((value, ctx) => {
    if (value === '') return;
    const result = passwordRule.safeParse(value);
    if (!result.success) {
      for (const issue of result.error.issues) ctx.addIssue({ code: 'custom', message: issue.message });
    }
  }),
});

export type EditUserFormValues = z.infer<typeof editUserFormSchema>;

export function editFormValuesOf(user: User): EditUserFormValues {
  return { displayName: user.displayName, role: user.role, wardIds: [...user.wardIds], password: '' };
}

function sameIds(a: readonly number[], b: readonly number[]): boolean {
  const left = [...a].sort((x, y) => x - y);
  const right = [...b].sort((x, y) => x - y);
  return left.length === right.length && left.every((id, index) => id === right[index]);
}

/** Only what the admin changed, so the audit trail records exactly that. */
export function userChanges(user: User, values: EditUserFormValues): UpdateUserRequest {
  const changes: UpdateUserRequest = {};
  const displayName = values.displayName.trim();
  if (displayName !== user.displayName) changes.displayName = displayName;
  if (values.role !== user.role) changes.role = values.role;
  if (!sameIds(values.wardIds, user.wardIds)) changes.wardIds = values.wardIds;
  if (values.password !== '') changes.password = values.password;
  return changes;
}
