export const metadata = { title: "Check your e-mail" };

export default function CheckMailPage() {
  return (
    <div className="mx-auto max-w-md">
      <h1 className="text-2xl font-semibold">Check your e-mail</h1>
      <p className="mt-3 text-stone-700">
        If an account exists for that address, a sign-in link is on its way. It works once and expires in 15 minutes.
      </p>
    </div>
  );
}
