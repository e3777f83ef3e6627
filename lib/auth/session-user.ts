import "server-only";

import { getServerSession } from "next-auth";
import { cache } from "react";

import { db } from "@/lib/db/knex";

import { authOptions } from "./auth-options";

export type SessionUser = { id: string; email: string; name: string; isOperator: boolean };

type UserRow = { id: string; email: string; name: string; is_operator: boolean; session_epoch: number };

/**
 * The user of a verified session, read fresh from the database: a deleted user's JWT stops working, and so does one
 * issued before the person's session epoch was raised (password replaced, removed from a vendor).
 */
export async function sessionUserFor(session: { id?: string; epoch?: number } | undefined): Promise<SessionUser | null> {
  if (!session?.id) return null;
  const row = await db("users").where({ id: session.id }).first<UserRow | undefined>("id", "email", "name", "is_operator", "session_epoch");
  if (!row || row.session_epoch !== (session.epoch ?? 0)) return null;
  return { id: row.id, email: row.email, name: row.name, isOperator: row.is_operator };
}

export const findSessionUser = cache(async (): Promise<SessionUser | null> => sessionUserFor((await getServerSession(authOptions))?.user));
