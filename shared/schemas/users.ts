import { z } from 'zod';
import { displayNameSchema, emailSchema, roles } from './auth';

export const listUsersQuerySchema = z
  .object({
    page: z.coerce.number().int().min(1).default(1),
    perPage: z.coerce.number().int().min(1).max(100).default(25),
    sort: z.enum(['displayName', '-displayName', 'email', '-email', 'createdAt', '-createdAt', 'role', '-role']).default('displayName'),
    q: z.string().trim().max(100).optional(),
    role: z.enum(roles).optional(),
  })
  .strict();

export const inviteUserSchema = z
  .object({ email: emailSchema, displayName: displayNameSchema, role: z.enum(roles, { error: 'Choose a role' }) })
  .strict();

export const userIdParamsSchema = z.object({ id: z.coerce.number().int().positive({ error: 'User id must be a positive number' }) });

export const verifyEmailSchema = z.object({ token: z.string().trim().min(1).max(512) }).strict();

export type ListUsersQuery = z.infer<typeof listUsersQuerySchema>;
export type InviteUserInput = z.infer<typeof inviteUserSchema>;
