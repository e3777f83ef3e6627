import type { ActionState } from "@/lib/actions/action-state";

export function FormMessage({ state, success }: { state: ActionState; success?: string }) {
  if (state.ok && success)
    return (
      <p role="status" className="text-sm text-green-800">
        ✓ {success}
      </p>
    );
  if (!state.ok && state.message)
    return (
      <p role="alert" className="text-sm text-red-800">
        ⚠ {state.message}
      </p>
    );
  return null;
}
