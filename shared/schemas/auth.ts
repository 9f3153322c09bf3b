/**
 * The sign-in payload, apart from the rest of the API schemas so that the sign-in page does not
 * carry the design document schema (and with it the units parser) in its bundle. Re-exported by api.ts.
 */
import { z } from 'zod';

export const loginSchema = z.object({
  email: z.email('must be an e-mail address'),
  password: z.string().min(1, 'is required').max(200),
});
/** What the sign-in form sends. */
export type LoginBody = z.input<typeof loginSchema>;

/** Changing one's own password (the strength rule is checked on the server). */
export const changePasswordSchema = z.object({
  currentPassword: z.string().min(1, 'is required').max(200),
  newPassword: z.string().min(10, 'must be at least 10 characters').max(200),
});
export type ChangePasswordRequest = z.output<typeof changePasswordSchema>;
export type ChangePasswordBody = z.input<typeof changePasswordSchema>;
