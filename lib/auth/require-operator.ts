import "server-only";

import { notFound, redirect } from "next/navigation";

import { findSessionUser, type SessionUser } from "./session-user";

/** The platform operator is a flag on the user; everyone else gets a 404 for /operator. */
export async function requireOperator(): Promise<SessionUser> {
  const user = await findSessionUser();
  if (!user) redirect("/sign-in?callbackUrl=/operator");
  if (!user.isOperator) notFound();
  return user;
}
