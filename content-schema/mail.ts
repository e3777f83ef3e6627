import { z } from "zod";

export const mailMessageSchema = z.object({
  to: z.string().email(),
  subject: z.string().min(1).max(300),
  text: z.string().max(200_000),
  html: z.string().max(400_000).optional(),
  replyTo: z.string().optional(),
  headers: z.record(z.string(), z.string()).optional(),
});
export type MailMessage = z.infer<typeof mailMessageSchema>;
