import { z } from 'zod';

export const roles = ['reader', 'contributor', 'editor', 'admin'] as const;
export type Role = (typeof roles)[number];

/** The user as the API presents it; never carries the password hash. */
export interface PublicUser {
  id: number;
  email: string;
  displayName: string;
  role: Role;
  active: boolean;
  emailVerifiedAt: string | null;
  createdAt: string;
}

export const passwordLimits = { min: 12, max: 200 } as const;
export const displayNameLimits = { min: 1, max: 80 } as const;
export const emailMaxLength = 254;

/**
 * Passwords refused outright: the commonest breached choices plus the obvious
 * ones for a woodwind archive. Compared case-insensitively, ignoring outer spaces.
 */
export const commonPasswords: readonly string[] = [
  '123456789012',
  '1234567890123',
  'qwertyuiopas',
  'qwerty123456',
  'password1234',
  'password12345',
  'passwordpassword',
  'iloveyou1234',
  'letmein12345',
  'welcome12345',
  'changeme1234',
  'administrator',
  'aaaaaaaaaaaa',
  'abcdefghijkl',
  'abc123abc123',
  'windway12345',
  'windwaywindway',
  'recorder1234',
  'recorder12345',
  'blockflute123',
  'flute1234567',
  'traverso1234',
  'baroqueflute',
  'greatbass1234',
  'demo-password',
  'demopassword1',
];

const commonPasswordSet = new Set(commonPasswords.map((p) => p.toLowerCase()));

export function isCommonPassword(password: string): boolean {
  return commonPasswordSet.has(password.trim().toLowerCase());
}

export const emailSchema = z
  .string({ error: 'Enter your e-mail address' })
  .trim()
  .toLowerCase()
  .min(1, { error: 'Enter your e-mail address' })
  .max(emailMaxLength, { error: `Use at most ${emailMaxLength} characters` })
  .pipe(z.email({ error: 'Enter an e-mail address such as name@example.org' }));

export const newPasswordSchema = z
  .string({ error: 'Choose a password' })
  .min(passwordLimits.min, { error: `Use at least ${passwordLimits.min} characters` })
  .max(passwordLimits.max, { error: `Use at most ${passwordLimits.max} characters` })
  .refine((value) => !isCommonPassword(value), {
    error: 'This password is too common; choose a longer phrase of your own',
  });

export const displayNameSchema = z
  .string({ error: 'Enter your name as it should be credited' })
  .trim()
  .min(displayNameLimits.min, { error: 'Enter your name as it should be credited' })
  .max(displayNameLimits.max, { error: `Use at most ${displayNameLimits.max} characters` });

export const registerSchema = z
  .object({
    email: emailSchema,
    displayName: displayNameSchema,
    password: newPasswordSchema,
  })
  .strict();

export const loginSchema = z
  .object({
    email: emailSchema,
    // No length rules on sign-in: a wrong password gets the same answer as any other.
    password: z
      .string({ error: 'Enter your password' })
      .min(1, { error: 'Enter your password' })
      .max(passwordLimits.max, { error: 'Enter your password' }),
  })
  .strict();

export const passwordResetRequestSchema = z.object({ email: emailSchema }).strict();

export const passwordResetConfirmSchema = z
  .object({
    token: z
      .string({ error: 'The reset link is incomplete' })
      .trim()
      .min(1, { error: 'The reset link is incomplete' })
      .max(512, { error: 'The reset link is not valid' }),
    password: newPasswordSchema,
  })
  .strict();

export const updateUserSchema = z
  .object({
    role: z.enum(roles, { error: 'Choose reader, contributor, editor or admin' }).optional(),
    active: z.boolean({ error: 'Active must be true or false' }).optional(),
  })
  .strict();

export type RegisterInput = z.infer<typeof registerSchema>;
export type LoginInput = z.infer<typeof loginSchema>;
export type PasswordResetRequestInput = z.infer<typeof passwordResetRequestSchema>;
export type PasswordResetConfirmInput = z.infer<typeof passwordResetConfirmSchema>;
export type UpdateUserInput = z.infer<typeof updateUserSchema>;

/** `GET /api/auth/me` */
export interface SessionResponse {
  user: PublicUser | null;
  csrfToken: string;
  demo: boolean;
  mailCapture: boolean;
}

/** `POST /api/auth/login` and `POST /api/auth/register` */
export interface AuthResponse {
  user: PublicUser;
  csrfToken: string;
}
