import { NotFoundMessage } from "@/components/ui/not-found-message";

export default function NotFound() {
  return (
    <main className="mx-auto max-w-xl px-4 py-8">
      <NotFoundMessage />
    </main>
  );
}
