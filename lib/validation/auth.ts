import { z } from "zod";
import { roles } from "@/db/schema/users";
import { commonPasswords, MAX_PASSWORD_LENGTH, MIN_PASSWORD_LENGTH } from "@/lib/auth/common-passwords";

export const emailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .max(254, "That e-mail address is too long.")
  .email("Enter a valid e-mail address, like name@example.com.");

/** A new password: 12–256 characters and not on the common-password list. */
export const newPasswordSchema = z
  .string()
  .min(MIN_PASSWORD_LENGTH, `Use at least ${MIN_PASSWORD_LENGTH} characters.`)
  .max(MAX_PASSWORD_LENGTH, `Use at most ${MAX_PASSWORD_LENGTH} characters.`)
  .refine((p) => !commonPasswords.has(p.toLowerCase()), "That password is too common. Choose another.");

const nameSchema = z.string().trim().min(1, "Enter your name.").max(120, "Use at most 120 characters.");

export const signInSchema = z
  .object({
    email: emailSchema,
    password: z.string().min(1, "Enter your password.").max(MAX_PASSWORD_LENGTH, "That password is too long."),
  })
  .strict();

export const signUpSchema = z
  .object({
    name: nameSchema,
    email: emailSchema,
    password: newPasswordSchema,
    workspaceName: z.string().trim().min(2, "Name your business (at least 2 characters).").max(120, "Use at most 120 characters."),
  })
  .strict();

export const requestResetSchema = z.object({ email: emailSchema }).strict();

const tokenSchema = z.string().regex(/^[A-Za-z0-9_-]{20,100}$/, "This link is not valid.");

export const resetPasswordSchema = z.object({ token: tokenSchema, password: newPasswordSchema }).strict();

export const changePasswordSchema = z
  .object({
    currentPassword: z.string().min(1, "Enter your current password.").max(MAX_PASSWORD_LENGTH),
    newPassword: newPasswordSchema,
  })
  .strict();

export const inviteSchema = z.object({ email: emailSchema, role: z.enum(roles, "Choose a role.") }).strict();

export const acceptInvitationSchema = z
  .object({
    token: tokenSchema,
    // For a new account: name and a new password. For an existing one: its password.
    name: z.string().trim().max(120).optional(),
    password: z.string().min(1, "Enter a password.").max(MAX_PASSWORD_LENGTH, "That password is too long."),
  })
  .strict();

export const idSchema = z.string().uuid("Unknown item.");

export const changeRoleSchema = z.object({ userId: idSchema, role: z.enum(roles, "Choose a role.") }).strict();
export const memberSchema = z.object({ userId: idSchema }).strict();
export const invitationIdSchema = z.object({ invitationId: idSchema }).strict();
export const switchWorkspaceSchema = z.object({ workspaceId: idSchema }).strict();
export const emptySchema = z.object({}).strict();
