import { z } from "zod";

export const emailSchema = z.string().trim().toLowerCase().email("Enter a valid e-mail address.").max(254);
export const passwordSchema = z.string().min(10, "At least 10 characters.").max(200, "At most 200 characters.");

export const credentialsSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, "Enter your password.").max(200),
});

export const signUpSchema = z.object({
  name: z.string().trim().min(1, "Enter your name.").max(120),
  email: emailSchema,
  password: passwordSchema,
});
export type SignUpInput = z.infer<typeof signUpSchema>;

/** The account page's password change; the current password is empty only for an account that has none yet. */
export const changePasswordSchema = z
  .object({
    currentPassword: z.string().max(200, "At most 200 characters."),
    newPassword: passwordSchema,
    repeatPassword: z.string().max(200, "At most 200 characters."),
  })
  .refine((v) => v.newPassword === v.repeatPassword, { message: "The two new passwords differ.", path: ["repeatPassword"] });
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;
