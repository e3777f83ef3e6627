import type { DefaultSession } from "next-auth";

declare module "next-auth" {
  interface Session {
    user: { id: string; epoch?: number } & DefaultSession["user"];
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    /** The person's session epoch when this session was issued (lib/auth/session-user.ts). */
    epoch?: number;
  }
}
