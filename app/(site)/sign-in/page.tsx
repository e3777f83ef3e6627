import { SignInForms } from "@/components/auth/sign-in-forms";
import { appUrl } from "@/lib/http/app-url";
import { safeCallbackPath, safeVendorParam } from "@/lib/http/safe-callback";

import { resendVerificationAction } from "./actions";

export const metadata = { title: "Sign in" };

type Search = Promise<{ callbackUrl?: string; error?: string; vendor?: string }>;

export default async function SignInPage({ searchParams }: { searchParams: Search }) {
  const { callbackUrl, error, vendor } = await searchParams;
  return (
    <div className="mx-auto max-w-md">
      <h1 className="text-2xl font-semibold">Sign in</h1>
      {error ? (
        <p role="alert" className="mt-4 rounded border border-red-300 bg-red-50 p-3 text-sm text-red-900">
          ⚠{" "}
          {error === "CredentialsSignin"
            ? "E-mail or password is not right."
            : error === "AccessDenied"
              ? "There is no account for that e-mail, or too many links were asked for. Try again later."
              : "Sign-in failed. Try again."}
        </p>
      ) : null}
      <SignInForms
        resendVerificationAction={resendVerificationAction}
        callbackUrl={safeCallbackPath(callbackUrl, appUrl("/"))}
        vendor={safeVendorParam(vendor)}
      />
    </div>
  );
}
