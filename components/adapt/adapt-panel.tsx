"use client";

import { useMemo, useState } from "react";

import { LazyFeedSpeedChart } from "@/components/bench/lazy-feed-speed-chart";
import { useUnitsPreference } from "@/components/units/use-units-preference";
import type { EntryCapabilityKey } from "@/content-schema/setup-fields";
import type { AdaptContext } from "@/lib/adapt/adapt-context";
import { computeAdaptation, readAdhocMachine, type AdhocMachineDraft, type OverrideDraft } from "@/lib/adapt/compute-adaptation";
import { feedSpeedCurve } from "@/lib/bench/feed-speed-curve";
import { machineToInput, type Machine } from "@/lib/bench/machine-rows";
import { noStepsNote, numbersDiffer } from "@/lib/bench/setup-sheet-data";
import type { UnitSystem } from "@/lib/machining";

import { EntryAdvice } from "./entry-advice";
import { EntryCapabilityPicker } from "./entry-capability-picker";
import { ADHOC, MachinePicker } from "./machine-picker";
import { resultRows, ResultTable } from "./result-table";
import { SaveSetupForm, type SaveSetupAction } from "./save-setup-form";
import { StepsTrail } from "./steps-trail";
import { TextInput } from "./text-input";
import { UnitsSwitch } from "./units-switch";
import { useAdaptationBeacon } from "./use-adaptation-beacon";
import { WarningList } from "./warning-list";

export type AdaptPanelProps = {
  context: AdaptContext;
  operationIndex?: number;
  machines?: Machine[];
  units?: UnitSystem;
  vendorSlug: string;
  /** Present for signed-in customers: saves a setup. */
  saveAction?: SaveSetupAction;
  signInHref?: string;
  /** Re-adapting a saved setup: start on its machine with the customer's own changes. */
  initialMachineId?: string;
  initialOverrides?: OverrideDraft;
};

const EMPTY_DRAFT: AdhocMachineDraft = {
  rpmMin: "",
  rpmMax: "",
  power: "",
  maxFeed: "",
  rigidity: "light",
  zThrust: "",
  stickout: "",
  spindleKind: "constant-torque",
  ratedRpm: "",
};

/** Adapts one sheet operation to a machine as you type, with the rules that changed each number. */
export function AdaptPanel({
  context,
  operationIndex = 0,
  machines = [],
  units: pageUnits = "metric",
  vendorSlug,
  saveAction,
  signInHref,
  initialMachineId,
  initialOverrides,
}: AdaptPanelProps) {
  const [machineId, setMachineId] = useState(machines.find((m) => m.id === initialMachineId)?.id ?? machines[0]?.id ?? ADHOC);
  const [draft, setDraft] = useState(EMPTY_DRAFT);
  const [opIndex, setOpIndex] = useState(context.operations[operationIndex] ? operationIndex : 0);
  const [overrides, setOverrides] = useState<OverrideDraft>(initialOverrides ?? { ae: "", ap: "", stickout: "" });
  const { units, choose: chooseUnits, pending: unitsPending } = useUnitsPreference(pageUnits);
  const [entryCapability, setEntryCapability] = useState<EntryCapabilityKey>("ramp");

  const { adaptation, machine } = useMemo(() => {
    const errors: Record<string, string> = {};
    const saved = machines.find((m) => m.id === machineId);
    const machine = saved ? machineToInput(saved) : machineId === ADHOC ? readAdhocMachine(draft, units, errors) : null;
    return {
      machine,
      adaptation: computeAdaptation({ context, operationIndex: opIndex, machine, overrides, units, entryCapability, errors }),
    };
  }, [context, machines, machineId, draft, opIndex, overrides, units, entryCapability]);

  const op = context.operations[opIndex];
  // Nothing typed yet: invite the reader to type a machine instead of greeting them with errors.
  const untouched = machineId === ADHOC && !draft.rpmMin && !draft.rpmMax && !draft.power && !draft.maxFeed;
  const errors = adaptation.ok || untouched ? {} : adaptation.errors;
  const result = adaptation.ok ? adaptation.result : null;
  const setOverride = (key: keyof OverrideDraft) => (value: string) => setOverrides({ ...overrides, [key]: value });
  const curve =
    result && machine
      ? feedSpeedCurve({
          machine,
          diameterMm: context.cutter.diameterMm,
          flutes: context.cutter.flutes,
          chipLoadMm: result.chipLoadMm,
          minChipLoadMm: context.material.minChipLoadMm,
          vcWindowMpm: [context.material.vcMinMpm, context.material.vcMaxMpm],
          adapted: result,
          units,
        })
      : null;
  const savedMachine = machines.some((m) => m.id === machineId);
  useAdaptationBeacon({
    vendorSlug,
    versionId: context.versionId,
    adaptationKey: savedMachine ? machineId : JSON.stringify(draft),
    ok: Boolean(result),
  });

  return (
    <div className="mt-3 space-y-4" data-adapt-panel>
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div className="flex min-w-56 flex-col gap-1">
          <label htmlFor="adapt-operation" className="text-sm font-medium">
            Operation
          </label>
          <select
            id="adapt-operation"
            value={opIndex}
            onChange={(e) => setOpIndex(Number(e.target.value))}
            className="min-h-11 rounded border border-stone-300 bg-white px-3 text-base"
          >
            {context.operations.map((o) => (
              <option key={o.index} value={o.index}>
                {o.label}
              </option>
            ))}
          </select>
        </div>
        <UnitsSwitch units={units} onChange={chooseUnits} pending={unitsPending} />
      </div>
      <MachinePicker
        machines={machines}
        machineId={machineId}
        onMachineId={setMachineId}
        draft={draft}
        onDraft={setDraft}
        units={units}
        errors={errors}
      />
      <EntryCapabilityPicker value={entryCapability} onChange={setEntryCapability} />
      <fieldset className="grid gap-3 sm:grid-cols-3">
        <legend className="mb-1 text-sm font-semibold">Your changes (optional)</legend>
        <TextInput
          id="override-ae"
          label="ae (radial depth)"
          hint='e.g. 1/16, 1.5 mm or 0.06"'
          value={overrides.ae}
          onChange={setOverride("ae")}
          error={errors.ae}
        />
        <TextInput
          id="override-ap"
          label="ap (axial depth)"
          hint="e.g. 3 mm or 1/8"
          value={overrides.ap}
          onChange={setOverride("ap")}
          error={errors.ap}
        />
        <TextInput
          id="override-stickout"
          label="Stick-out"
          hint="from collet nut to tip"
          value={overrides.stickout}
          onChange={setOverride("stickout")}
          error={errors.stickout}
        />
      </fieldset>
      {untouched ? (
        <p className="text-sm text-stone-700">
          Type your machine&apos;s limits, or start from a kind of machine, to see the sheet adapted to it.
        </p>
      ) : null}
      {errors.machine ? (
        <p role="alert" className="text-sm text-red-800">
          <span aria-hidden>⚠ </span>
          {errors.machine}
        </p>
      ) : null}
      {op ? <ResultTable rows={resultRows(op, context.cutter, result)} units={units} /> : null}
      {result ? (
        <>
          <EntryAdvice result={result} entryCapability={entryCapability} units={units} />
          <section aria-labelledby="adapt-steps">
            <h3 id="adapt-steps" className="text-sm font-semibold">
              How these numbers were found
            </h3>
            <StepsTrail
              steps={result.steps}
              units={units}
              emptyText={
                op
                  ? noStepsNote(
                      resultRows(op, context.cutter, result).filter((r) => numbersDiffer(r.sheet, r.adapted)).length,
                      Object.values(overrides).some((v) => v.trim()),
                    )
                  : undefined
              }
            />
          </section>
          <section aria-labelledby="adapt-warnings">
            <h3 id="adapt-warnings" className="text-sm font-semibold">
              Before you cut
            </h3>
            <WarningList warnings={result.warnings} />
          </section>
          {curve ? <LazyFeedSpeedChart curve={curve} units={units} /> : null}
          {saveAction && savedMachine && adaptation.ok ? (
            <SaveSetupForm
              action={saveAction}
              vendorSlug={vendorSlug}
              versionId={context.versionId}
              machineId={machineId}
              operationIndex={opIndex}
              overridesMm={adaptation.overridesMm}
              units={units}
              entryCapability={entryCapability}
            />
          ) : saveAction ? (
            <p className="text-sm text-stone-600">
              Register this machine on your{" "}
              <a className="underline" href={`/${vendorSlug}/bench/machines/new`}>
                Bench
              </a>{" "}
              to save the result as a setup.
            </p>
          ) : signInHref ? (
            <p className="text-sm text-stone-600">
              <a className="underline" href={signInHref}>
                Sign in
              </a>{" "}
              to save this as a setup and hear when the sheet changes.
            </p>
          ) : null}
        </>
      ) : null}
    </div>
  );
}
