import { z } from './zod-setup';
import { callsignField, emailField, nameText, passwordField } from './fields';

export const signInInput = z.object({
  email: emailField,
  password: z.string().min(1, 'Enter your password').max(200),
});
export type SignInInput = z.infer<typeof signInInput>;

export const registerInput = z.object({
  email: emailField,
  displayName: nameText(80).min(2, 'Use at least 2 characters'),
  password: passwordField,
  callsign: z.union([callsignField, z.literal('')]).optional(),
});
export type RegisterInput = z.infer<typeof registerInput>;

/** What a signed-in person may change about themself: the name others see and the personal callsign (empty clears it). */
export const profileInput = z.object({ displayName: registerInput.shape.displayName, callsign: z.union([callsignField, z.literal('')]) });
export type ProfileInput = z.input<typeof profileInput>;

export const resetRequestInput = z.object({ email: emailField });
export type ResetRequestInput = z.infer<typeof resetRequestInput>;

export const resetConfirmInput = z.object({
  token: z.string().min(20, 'The reset link is incomplete').max(200),
  password: passwordField,
});
export type ResetConfirmInput = z.infer<typeof resetConfirmInput>;

const currentPasswordField = z.string().min(1, 'Enter your current password').max(200);

/** A new password for a signed-in person, who proves it is them with the current one. */
export const passwordChangeInput = z
  .object({ currentPassword: currentPasswordField, newPassword: passwordField })
  .refine((v) => v.newPassword !== v.currentPassword, {
    message: 'Choose a password that differs from the current one',
    path: ['newPassword'],
  });
export type PasswordChangeInput = z.infer<typeof passwordChangeInput>;

/** A new sign-in address; it takes effect only when the link mailed to it is opened. */
export const emailChangeInput = z.object({ newEmail: emailField, password: currentPasswordField });
export type EmailChangeInput = z.infer<typeof emailChangeInput>;

export const emailConfirmInput = z.object({ token: z.string().min(20, 'The confirmation link is incomplete').max(200) });
export type EmailConfirmInput = z.infer<typeof emailConfirmInput>;

/** Deleting an account is confirmed by typing its password. */
export const accountDeleteInput = z.object({ password: currentPasswordField });
export type AccountDeleteInput = z.infer<typeof accountDeleteInput>;
