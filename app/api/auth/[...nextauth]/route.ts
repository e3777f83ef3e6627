import NextAuth from "next-auth";

import { authOptions } from "@/lib/auth/auth-options";

// GET|POST /api/auth/*: next-auth sign-in, callback, session and sign-out endpoints.
const handler = NextAuth(authOptions);

export { handler as GET, handler as POST };
