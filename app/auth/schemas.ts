import { z } from "zod";
import { STAFF_ROLES } from "~/vocabulary/roles";

// Shared by the forms (client-side hints) and the actions (the check that counts).
const PASSWORD_MIN = 12; // NIST SP 800-63B asks for at least 8; we ask a little more
const PASSWORD_MAX = 200;

const email = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .max(254)
  .pipe(z.email({ error: "Enter an e-mail address like name@example.com." }));
const newPassword = z
  .string({ error: `Choose a password of at least ${PASSWORD_MIN} characters.` })
  .min(PASSWORD_MIN, { error: `Use at least ${PASSWORD_MIN} characters; a few unrelated words work well.` })
  .max(PASSWORD_MAX, { error: `Use at most ${PASSWORD_MAX} characters.` });

const passwordsMatch = { path: ["confirmPassword"], error: "The two passwords differ." };
const sameTwice = (value: { password: string; confirmPassword: string }) => value.password === value.confirmPassword;
const confirmPassword = z.string({ error: "Type the password again." });

export const signUpSchema = z
  .object({
    displayName: z
      .string({ error: "Tell us what to call you." })
      .trim()
      .min(1)
      .max(120, { error: "Keep it under 120 characters." }),
    email,
    password: newPassword,
    confirmPassword,
  })
  .refine(sameTwice, passwordsMatch);

export const signInSchema = z.object({
  email,
  password: z.string({ error: "Enter your password." }).max(PASSWORD_MAX),
  next: z.string().optional(),
});

export const forgotPasswordSchema = z.object({ email });

export const resetPasswordSchema = z
  .object({ password: newPassword, confirmPassword })
  .refine(sameTwice, passwordsMatch);

export const userAdminSchema = z.discriminatedUnion("intent", [
  z.object({ intent: z.literal("change-role"), userId: z.coerce.number().int().positive(), role: z.enum(STAFF_ROLES) }),
  z.object({ intent: z.literal("revoke-sessions"), userId: z.coerce.number().int().positive() }),
]);
