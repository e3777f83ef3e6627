"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";

import { findSessionUser } from "@/lib/auth/session-user";
import { discardDeadLetters, retryDeadLetters } from "@/lib/mail/dead-letters";

const input = z.object({ id: z.union([z.literal(""), z.uuid()]).default("") });

async function operatorInput(form: FormData): Promise<string | undefined | null> {
  const user = await findSessionUser();
  if (!user?.isOperator) return null;
  const parsed = input.safeParse({ id: form.get("id") ?? "" });
  if (!parsed.success) return null;
  return parsed.data.id || undefined;
}

/** Retry one dead letter (id) or all of them (no id), on a fresh retry schedule. */
export async function retryDeadLettersAction(form: FormData): Promise<void> {
  const id = await operatorInput(form);
  if (id === null) return;
  await retryDeadLetters(id);
  revalidatePath("/operator");
}

/** Discard one dead letter (id) or all of them (no id). */
export async function discardDeadLettersAction(form: FormData): Promise<void> {
  const id = await operatorInput(form);
  if (id === null) return;
  await discardDeadLetters(id);
  revalidatePath("/operator");
}
