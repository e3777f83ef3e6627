"use client";

import { useState } from "react";

import { Field } from "@/components/forms/field";
import { FormMessage } from "@/components/forms/form-message";
import { SubmitButton } from "@/components/forms/submit-button";
import { useValidatedAction } from "@/components/forms/use-validated-action";
import type { Vendor } from "@/content-schema/vendor";
import { brandingSchema, WILSON_CONFIDENCE_CHOICES } from "@/content-schema/vendor-branding";
import type { FormAction } from "@/lib/actions/action-state";
import { contrastRatio, inkFor } from "@/lib/ui/contrast";
import { explainAccentColor } from "@/lib/vendors/explain-accent-color";

export function BrandingForm({ vendor, updateBrandingAction }: { vendor: Vendor; updateBrandingAction: FormAction }) {
  const { state, formAction, onSubmit, errors } = useValidatedAction(updateBrandingAction, brandingSchema.passthrough());
  const [accent, setAccent] = useState(vendor.accentColor);
  const why = explainAccentColor(accent);
  const valid = why === null;
  return (
    <form
      action={formAction}
      onSubmit={onSubmit}
      noValidate
      className="grid gap-4 rounded-lg border border-stone-200 bg-white p-5 sm:grid-cols-2"
    >
      <input type="hidden" name="vendor" value={vendor.slug} />
      <Field label="Workspace name" name="name" defaultValue={vendor.name} errors={errors.name} />
      <div>
        <Field
          label="Accent colour"
          name="accentColor"
          value={accent}
          onChange={(e) => setAccent(e.target.value)}
          errors={errors.accentColor}
          hint="Hex, like #2f5d8a. Text on it is chosen for contrast."
        />
        {valid ? (
          <p className="mt-2 flex items-center gap-2 text-sm">
            <span className="rounded px-3 py-1" style={{ backgroundColor: accent, color: inkFor(accent) }}>
              Sample
            </span>
            <span className="num">{contrastRatio(accent, inkFor(accent)).toFixed(1)} : 1</span>
          </p>
        ) : !errors.accentColor ? (
          <p className="mt-2 text-sm text-amber-900" aria-live="polite" data-accent-why>
            {why}
          </p>
        ) : null}
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor="logo" className="text-sm font-medium">
          Logo (PNG, JPEG or WebP, at most 256 KB)
        </label>
        <input id="logo" name="logo" type="file" accept="image/png,image/jpeg,image/webp" className="min-h-11" />
        {errors.logo ? <p className="text-sm text-red-800">⚠ {errors.logo.join(" ")}</p> : null}
      </div>
      <fieldset className="flex flex-col gap-2 text-sm">
        <legend className="font-medium">Settings</legend>
        <label className="flex items-center gap-2">
          <input type="checkbox" name="libraryPublic" defaultChecked={vendor.settings.libraryPublic} className="h-5 w-5" /> Library open to
          visitors (otherwise signed-in customers only)
        </label>
        <label className="flex items-center gap-2">
          <input type="checkbox" name="requireSecondApproval" defaultChecked={vendor.settings.requireSecondApproval} className="h-5 w-5" />{" "}
          Publishing needs approval by a second engineer
        </label>
        <label htmlFor="wilsonConfidence" className="mt-1 font-medium">
          Field results: confidence of the failure interval
        </label>
        <select
          id="wilsonConfidence"
          name="wilsonConfidence"
          aria-describedby="wilsonConfidence-hint"
          defaultValue={String(vendor.settings.wilsonConfidence)}
          className="min-h-11 max-w-xs rounded border border-stone-300 bg-white px-3"
        >
          {WILSON_CONFIDENCE_CHOICES.map((c) => (
            <option key={c} value={c}>
              {Number(c) * 100} %
            </option>
          ))}
        </select>
        <span id="wilsonConfidence-hint" className="text-stone-600">
          Higher asks for more reports before a version ranks high in Needs attention.
        </span>
        {errors.wilsonConfidence ? <span className="text-red-800">⚠ {errors.wilsonConfidence.join(" ")}</span> : null}
      </fieldset>
      <div className="flex items-center gap-4 sm:col-span-2">
        <SubmitButton>Save branding and settings</SubmitButton>
        <FormMessage state={state} success={state.message} />
      </div>
    </form>
  );
}
