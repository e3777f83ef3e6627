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
