"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState, useTransition } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";

import { newSheetSchema } from "@/content-schema/sheet-workflow";
import { initialActionState, type ActionState } from "@/lib/actions/action-state";

type Option = { id: string; label: string; key: string };
type Props = {
  vendorSlug: string;
  cutters: Option[];
  materials: Option[];
  machineClasses: Option[];
  action: (s: ActionState, input: Record<string, unknown>) => Promise<ActionState>;
};
type Input = z.input<typeof newSheetSchema>;

const control = "min-h-11 rounded border border-stone-300 bg-white px-3 py-2 aria-[invalid=true]:border-red-700";

/** Pick the cutter, material and machine class; the slug is suggested from them. */
export function NewSheetForm({ vendorSlug, cutters, materials, machineClasses, action }: Props) {
  const [pending, start] = useTransition();
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<Input, unknown, z.output<typeof newSheetSchema>>({
    resolver: zodResolver(newSheetSchema),
    defaultValues: { slug: "", cutterId: "", materialId: "", machineClassId: "" },
  });
  const { errors } = form.formState;
  const suggest = () => {
    const [c, m, k] = [
      cutters.find((o) => o.id === form.getValues("cutterId")),
      materials.find((o) => o.id === form.getValues("materialId")),
      machineClasses.find((o) => o.id === form.getValues("machineClassId")),
    ];
    if (c && m && k && !form.getFieldState("slug").isDirty)
      form.setValue(
        "slug",
        `${m.key}-${c.key}-${k.key}`
          .toLowerCase()
          .replace(/[^a-z0-9]+/g, "-")
          .replace(/^-|-$/g, ""),
      );
  };
  const onSubmit = form.handleSubmit((values) =>
    start(async () => {
      const result = await action(initialActionState, { ...values, vendor: vendorSlug });
      if (!result.ok) {
        setMessage(result.message ?? "Not created.");
        for (const [name, msgs] of Object.entries(result.errors ?? {})) form.setError(name as keyof Input, { message: msgs.join(" ") });
      }
    }),
  );
  const select = (name: "cutterId" | "materialId" | "machineClassId", label: string, options: Option[]) => (
    <div className="flex flex-col gap-1">
      <label htmlFor={name} className="text-sm font-medium">
        {label}
      </label>
      <select id={name} className={control} aria-invalid={errors[name] ? true : undefined} {...form.register(name, { onChange: suggest })}>
        <option value="">Choose…</option>
        {options.map((o) => (
          <option key={o.id} value={o.id}>
            {o.label}
          </option>
        ))}
      </select>
      {errors[name] ? <p className="text-sm text-red-800">⚠ {errors[name]?.message}</p> : null}
    </div>
  );
  return (
    <form onSubmit={onSubmit} noValidate className="grid max-w-2xl gap-4">
      {select("cutterId", "Cutter", cutters)}
      {select("materialId", "Material", materials)}
      {select("machineClassId", "Machine class", machineClasses)}
      <div className="flex flex-col gap-1">
        <label htmlFor="slug" className="text-sm font-medium">
          Slug (the sheet&apos;s address, never changes)
        </label>
        <input id="slug" className={`${control} font-mono`} aria-invalid={errors.slug ? true : undefined} {...form.register("slug")} />
        {errors.slug ? <p className="text-sm text-red-800">⚠ {errors.slug.message}</p> : null}
      </div>
      <div className="flex items-center gap-3">
        <button
          type="submit"
          disabled={pending}
          className="min-h-11 rounded bg-accent px-4 py-2 font-medium text-accent-ink disabled:opacity-60"
        >
          {pending ? "Creating…" : "Create the draft"}
        </button>
        {message ? (
          <p role="alert" className="text-sm text-red-800">
            ⚠ {message}
          </p>
        ) : null}
      </div>
    </form>
  );
}
