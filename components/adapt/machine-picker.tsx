"use client";

import { MACHINE_PRESETS, presetByKey } from "@/content-schema/machine-presets";
import { RIGIDITY_CLASSES, type RigidityKey } from "@/content-schema/machine-rigidity";
import { SPINDLE_KIND_KEYS, spindleKindLabels, type SpindleKindKey } from "@/content-schema/spindle-kind-labels";
import type { AdhocMachineDraft } from "@/lib/adapt/compute-adaptation";
import type { Machine } from "@/lib/bench/machine-rows";
import type { UnitSystem } from "@/lib/machining";

import { TextInput } from "./text-input";

export const ADHOC = "adhoc";

type Props = {
  machines: Machine[];
  machineId: string;
  onMachineId: (id: string) => void;
  draft: AdhocMachineDraft;
  onDraft: (draft: AdhocMachineDraft) => void;
  units: UnitSystem;
  errors: Record<string, string>;
};

/** One of my machines, or a machine typed in on the spot (no sign-in needed). */
export function MachinePicker({ machines, machineId, onMachineId, draft, onDraft, units, errors }: Props) {
  const set = (key: keyof AdhocMachineDraft) => (value: string) => onDraft({ ...draft, [key]: value });
  const imperial = units === "imperial";
  function applyPreset(key: string) {
    const p = presetByKey(key);
    if (!p) return;
    onDraft({
      rpmMin: String(p.rpmMin),
      rpmMax: String(p.rpmMax),
      power: imperial ? (p.powerKw / 0.74569987158227022).toFixed(2) : String(p.powerKw),
      maxFeed: imperial ? `${Math.round(p.maxFeedMmMin / 25.4)} in/min` : `${p.maxFeedMmMin} mm/min`,
      rigidity: p.rigidity,
      zThrust: p.zThrustN ? (imperial ? String(Math.round(p.zThrustN / 4.4482216152605)) : String(p.zThrustN)) : "",
      stickout: `${p.stickoutMm} mm`,
      spindleKind: p.spindleKind,
      ratedRpm: p.ratedRpm ? String(p.ratedRpm) : "",
    });
  }
  return (
    <fieldset className="space-y-3">
      <legend className="text-sm font-semibold">Machine</legend>
      {machines.length ? (
        <div className="flex flex-col gap-1">
          <label htmlFor="adapt-machine" className="text-sm font-medium">
            Adapt to
          </label>
          <select
            id="adapt-machine"
            value={machineId}
            onChange={(e) => onMachineId(e.target.value)}
            className="min-h-11 rounded border border-stone-300 bg-white px-3 text-base"
          >
            {machines.map((m) => (
              <option key={m.id} value={m.id}>
                {m.name}
              </option>
            ))}
            <option value={ADHOC}>Another machine (type it in)</option>
          </select>
        </div>
      ) : null}
      {machineId === ADHOC ? (
        <div className="grid gap-3 sm:grid-cols-2">
          <div className="flex flex-col gap-1 sm:col-span-2">
            <label htmlFor="adhoc-preset" className="text-sm font-medium">
              Start from a kind of machine
            </label>
            <select
              id="adhoc-preset"
              defaultValue=""
              onChange={(e) => applyPreset(e.target.value)}
              className="min-h-11 rounded border border-stone-300 bg-white px-3 text-base"
            >
              <option value="">Type every number</option>
              {MACHINE_PRESETS.map((p) => (
                <option key={p.key} value={p.key}>
                  {p.label}
                </option>
              ))}
            </select>
          </div>
          <TextInput
            id="adhoc-rpm-min"
            label="Lowest spindle speed (rpm)"
            inputMode="numeric"
            value={draft.rpmMin}
            onChange={set("rpmMin")}
            error={errors.rpmMin}
          />
          <TextInput
            id="adhoc-rpm-max"
            label="Highest spindle speed (rpm)"
            inputMode="numeric"
            value={draft.rpmMax}
            onChange={set("rpmMax")}
            error={errors.rpmMax}
          />
          <TextInput
            id="adhoc-power"
            label={`Spindle power (${units === "imperial" ? "hp" : "kW"})`}
            inputMode="decimal"
            value={draft.power}
            onChange={set("power")}
            error={errors.power}
          />
          <TextInput
            id="adhoc-feed"
            label={`Highest feed (${units === "imperial" ? "in/min" : "mm/min"})`}
            value={draft.maxFeed}
            onChange={set("maxFeed")}
            error={errors.maxFeed}
          />
          <TextInput
            id="adhoc-thrust"
            label={`Z thrust, if known (${units === "imperial" ? "lbf" : "N"})`}
            inputMode="decimal"
            value={draft.zThrust}
            onChange={set("zThrust")}
            error={errors.zThrust}
          />
          <div className="flex flex-col gap-1">
            <label htmlFor="adhoc-spindle-kind" className="text-sm font-medium">
              Spindle drive
            </label>
            <select
              id="adhoc-spindle-kind"
              value={draft.spindleKind}
              onChange={(e) => onDraft({ ...draft, spindleKind: e.target.value as SpindleKindKey })}
              className="min-h-11 rounded border border-stone-300 bg-white px-3 text-base"
            >
              {SPINDLE_KIND_KEYS.map((k) => (
                <option key={k} value={k}>
                  {spindleKindLabels[k]}
                </option>
              ))}
            </select>
          </div>
          <TextInput
            id="adhoc-rated-rpm"
            label="Rated speed, if known (rpm)"
            hint="where a VFD spindle reaches full power"
            inputMode="numeric"
            value={draft.ratedRpm}
            onChange={set("ratedRpm")}
            error={errors.ratedRpm}
          />
          <TextInput
            id="adhoc-stickout"
            label="Usual stick-out"
            hint="e.g. 20 mm or 3/4"
            value={draft.stickout}
            onChange={set("stickout")}
            error={errors.machineStickout}
          />
          <div className="flex flex-col gap-1 sm:col-span-2">
            <label htmlFor="adhoc-rigidity" className="text-sm font-medium">
              How stiff is it?
            </label>
            <select
              id="adhoc-rigidity"
              value={draft.rigidity}
              onChange={(e) => onDraft({ ...draft, rigidity: e.target.value as RigidityKey })}
              className="min-h-11 rounded border border-stone-300 bg-white px-3 text-base"
            >
              {RIGIDITY_CLASSES.map((c) => (
                <option key={c.key} value={c.key}>
                  {c.label}
                </option>
              ))}
            </select>
          </div>
        </div>
      ) : null}
    </fieldset>
  );
}
