import "server-only";

import { getServerSession } from "next-auth";
import { cache } from "react";

import { db } from "@/lib/db/knex";

import { authOptions } from "./auth-options";

export type SessionUser = { id: string; email: string; name: string; isOperator: boolean };

/** The signed-in user, read fresh from the database (a deleted user's JWT stops working). */
export const getSessionUser = cache(async (): Promise<SessionUser | null> => {
  const session = await getServerSession(authOptions);
  const id = session?.user?.id;
  if (!id) return null;
  const row = await db("users").where({ id }).first<{ id: string; email: string; name: string; is_operator: boolean } | undefined>();
  return row ? { id: row.id, email: row.email, name: row.name, isOperator: row.is_operator } : null;
});
