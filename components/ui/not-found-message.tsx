import Link from "next/link";

export function NotFoundMessage() {
  return (
    <div className="py-16 text-center">
      <h1 className="text-2xl font-semibold">Not found</h1>
      <p className="mt-2 text-stone-600">There is nothing here, or you do not have access to it.</p>
      <Link href="/" className="mt-6 inline-block underline">
        Back to Swarfbook
      </Link>
    </div>
  );
}
