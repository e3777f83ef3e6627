import Link from "next/link";

import { SignOutButton } from "./sign-out-button";

type Props = {
  /** The signed-in person's name (or e-mail); null when nobody is signed in. */
  userName: string | null;
  /** What the person is here, e.g. "Customer" or "Platform operator". */
  roleLabel?: string | null;
  signInHref: string;
  signUpHref?: string;
  /** Extra links for the signed-in person (the operator's console). */
  links?: { href: string; label: string }[];
};

/** The right side of every header: who is signed in and Sign out, or Sign in. The same on every page. */
export function AccountArea({ userName, roleLabel, signInHref, signUpHref, links = [] }: Props) {
  return (
    <div className="ml-auto flex flex-wrap items-center gap-3 text-sm" data-account>
      {userName ? (
        <>
          {links.map((l) => (
            <Link key={l.href} href={l.href} className="rounded px-3 py-2 hover:bg-black/10">
              {l.label}
            </Link>
          ))}
          <span>
            {userName}
            {roleLabel ? <span className="opacity-80"> · {roleLabel}</span> : null}
          </span>
          <SignOutButton />
        </>
      ) : (
        <>
          <Link className="rounded px-3 py-2 hover:bg-black/10" href={signInHref}>
            Sign in
          </Link>
          {signUpHref ? (
            <Link className="rounded border border-current px-3 py-2" href={signUpHref}>
              Create an account
            </Link>
          ) : null}
        </>
      )}
    </div>
  );
}
