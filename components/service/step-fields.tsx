"use client";

import type { Dispatch, SetStateAction } from "react";
import type { ServiceStepId } from "@/lib/contracts/service-records";
import type { ServiceRecordSummary } from "@/lib/service/record-summary";
import { massEntryHint } from "@/lib/service/entry";
import { REPLACED_PART_IDS, REPLACED_PART_LABELS } from "@/lib/service/oil";
import { formatMass, formatVolume, UNIT_LABELS, VACUUM_EXAMPLES } from "@/lib/units";
import type { Draft, TextField } from "./draft";
import { EntryInput } from "./entry-input";
import { ResultLine } from "./result-line";
import type { CylinderChoice, ServiceRecordFormProps } from "./form-props";
import { PERFORMANCE_TEST_CONDITIONS } from "@/lib/interview/performance-test";

interface Props {
  step: ServiceStepId;
  draft: Draft;
  setDraft: Dispatch<SetStateAction<Draft>>;
  setText: (field: TextField, value: string) => void;
  errorOf: (field: string) => string | undefined;
  summary: ServiceRecordSummary;
  props: ServiceRecordFormProps;
}

function CylinderSelect({
  label,
  value,
  choices,
  onChange,
  error,
  massUnit,
}: {
  label: string;
  value: number | null;
  choices: CylinderChoice[];
  onChange: (id: number | null) => void;
  error?: string;
  massUnit: Parameters<typeof formatMass>[1];
}) {
  const id = `cyl-${label.replace(/\W+/g, "-").toLowerCase()}`;
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {label}
      </label>
      <select
        id={id}
        className="field-input"
        value={value ?? ""}
        onChange={(e) => onChange(e.target.value ? Number(e.target.value) : null)}
        aria-invalid={error ? true : undefined}
      >
        <option value="">Choose a cylinder</option>
        {choices.map((c) => (
          <option key={c.id} value={c.id}>
            {c.label} ({c.kind}, holds {formatMass(c.netG, massUnit)})
          </option>
        ))}
      </select>
      {choices.length === 0 && (
        <p className="mt-1 text-ink-soft">
          No cylinder of this kind and refrigerant is in the ledger yet: add one on the Ledger page.
        </p>
      )}
      {error && <p className="field-error">{error}</p>}
    </div>
  );
}

export function StepFields({ step, draft, setDraft, setText, errorOf, summary, props }: Props) {
  const u = props.units;
  // Examples in the reader's own system; any other unit typed after the number is read as well.
  const massHint = massEntryHint(u.mass);
  const volHint = `Type ${u.volume === "mL" ? "mL" : "fl oz"} or add a unit: ${u.volume === "mL" ? "45 mL" : "1.5 fl oz"}.`;
  const vacuumUnit = u.vacuum ?? (u.gauge === "kPa" ? "kPa" : "inHg");
  const vacuumExamples =
    vacuumUnit === "inHg" || vacuumUnit === "micron" ? "29.5 inHg or 500 microns" : VACUUM_EXAMPLES;
  const vacHint = `As the gauge shows it: ${vacuumExamples}. A bare number is read as ${UNIT_LABELS[vacuumUnit]}${vacuumUnit === "inHg" ? " of vacuum below the atmosphere" : vacuumUnit === "micron" ? " of mercury" : " absolute"}.`;
  const tempHint = `In ${UNIT_LABELS[u.temperature] ?? u.temperature}.`;
  const gaugeHint = `In ${UNIT_LABELS[u.gauge] ?? u.gauge} gauge.`;
  const t = draft.text;
  const f = (field: TextField, label: string, hint?: string) => (
    <EntryInput
      label={label}
      value={t[field]}
      onChange={(v) => setText(field, v)}
      hint={hint}
      error={errorOf(field)}
    />
  );

  switch (step) {
    case "identify":
      return (
        <div className="space-y-4">
          <fieldset className="space-y-2">
            <legend className="field-label">Spec-table row for this vehicle</legend>
            {props.specChoices.length === 0 && (
              <p className="text-ink-soft">
                No row of the shop&apos;s spec table matches this vehicle. Take the charge from the under-hood
                label.
              </p>
            )}
            {props.specChoices.map((s) => (
              <label
                key={s.id}
                className="flex min-h-glove items-start gap-3 rounded-card border-2 border-paper-line p-3"
              >
                <input
                  type="radio"
                  name="spec"
                  className="mt-1 h-6 w-6"
                  checked={draft.specEntryId === s.id}
                  onChange={() => setDraft((d) => ({ ...d, specEntryId: s.id }))}
                />
                <span>
                  <span className="block font-bold">{s.description}</span>
                  <span className="block text-ink-soft">
                    {formatMass(s.labelChargeG, u.mass)} · {s.oilType}
                    {s.totalOilMl ? ` · ${formatVolume(s.totalOilMl, u.volume)} oil in total` : ""}
                  </span>
                  <span className="block text-sm text-ink-soft">{s.reasons.join("; ")}</span>
                </span>
              </label>
            ))}
            {props.specChoices.length > 0 && (
              <button
                type="button"
                className="btn-quiet"
                onClick={() => setDraft((d) => ({ ...d, specEntryId: null }))}
              >
                None of these applies
              </button>
            )}
          </fieldset>
          {f("labelChargeG", "Label charge (under-hood label)", massHint)}
          <div className="grid grid-cols-2 gap-3">
            {f("purityPct", "Identifier: purity %")}
            {f("airPct", "Identifier: air %")}
          </div>
          {summary.target?.warnings.map((w) => (
            <ResultLine key={w} tone="bad">
              {w}
            </ResultLine>
          ))}
        </div>
      );
    case "recovery":
      return (
        <div className="space-y-4">
          <div className="grid gap-3 sm:grid-cols-2">
            <EntryInput
              type="datetime-local"
              label="Recovery started"
              value={t.recoveryStartedAt}
              onChange={(v) => setText("recoveryStartedAt", v)}
              error={errorOf("recoveryStartedAt")}
            />
            <EntryInput
              type="datetime-local"
              label="Recovery ended"
              value={t.recoveryEndedAt}
              onChange={(v) => setText("recoveryEndedAt", v)}
              error={errorOf("recoveryEndedAt")}
            />
          </div>
          {f("recoveredChargeG", "Recovered mass", massHint)}
          <CylinderSelect
            label="Recovered into cylinder"
            value={draft.recoveryCylinderId}
            choices={props.cylinders.filter((c) => c.kind === "recovery")}
            onChange={(id) => setDraft((d) => ({ ...d, recoveryCylinderId: id }))}
            error={errorOf("recoveryCylinderId")}
            massUnit={u.mass}
          />
          {f("oilRemovedMl", "Oil drained into the machine's bottle", volHint)}
          <label className="flex min-h-glove items-center gap-3">
            <input
              type="checkbox"
              className="h-6 w-6"
              checked={draft.oilPulled}
              onChange={(e) => setDraft((d) => ({ ...d, oilPulled: e.target.checked }))}
            />
            <span className="font-bold">Oil came out with liquid (recovery went too fast)</span>
          </label>
          <div>
            <label htmlFor="slow-note" className="field-label">
              Note on the recovery (optional)
            </label>
            <textarea
              id="slow-note"
              rows={2}
              className="field-input py-2"
              value={t.slowRecoveryNote}
              onChange={(e) => setText("slowRecoveryNote", e.target.value)}
            />
          </div>
          {summary.recovered && (
            <ResultLine
              tone={summary.recovered.verdict === "within" ? "good" : "bad"}
              sources={summary.recovered.sources}
              testId="recovered-vs-label"
            >
              {summary.recovered.sentence}
            </ResultLine>
          )}
          {summary.pulledOil && (
            <ResultLine tone="bad" sources={summary.pulledOil.sources} testId="pulled-oil">
              {summary.pulledOil.sentence}
            </ResultLine>
          )}
        </div>
      );
    case "evacuation":
      return (
        <div className="space-y-4">
          {f("deepestKpaAbs", "Deepest vacuum reached", vacHint)}
          {f("holdStartKpaAbs", "Vacuum at the start of the hold", vacHint)}
          {f("holdEndKpaAbs", "Vacuum at the end of the hold", vacHint)}
          {f("holdMinutes", "Hold time, minutes")}
          {summary.evacuation?.messages.map((m) => (
            <ResultLine
              key={m}
              tone={summary.evacuation?.reached ? "good" : "bad"}
              sources={summary.evacuation?.sources}
            >
              {m}
            </ResultLine>
          ))}
          {summary.hold && (
            <ResultLine
              tone={summary.hold.verdict === "pass" ? "good" : "bad"}
              sources={summary.hold.sources}
              testId="hold-verdict"
            >
              Hold {summary.hold.verdict === "pass" ? "passed" : "failed"}. {summary.hold.message}{" "}
              {summary.hold.warnings.join(" ")}
            </ResultLine>
          )}
        </div>
      );
    case "oil":
      return (
        <div className="space-y-4">
          <fieldset className="space-y-2">
            <legend className="field-label">Parts replaced</legend>
            {REPLACED_PART_IDS.map((part) => {
              const picked = draft.parts[part];
              return (
                <div key={part} className="rounded-card border-2 border-paper-line p-2">
                  <label className="flex min-h-touch items-center gap-3">
                    <input
                      type="checkbox"
                      className="h-6 w-6"
                      checked={Boolean(picked)}
                      onChange={(e) =>
                        setDraft((d) => {
                          const parts = { ...d.parts };
                          if (e.target.checked) parts[part] = { count: 1, measured: "" };
                          else delete parts[part];
                          return { ...d, parts };
                        })
                      }
                    />
                    <span>
                      {REPLACED_PART_LABELS[part]}
                      <span className="text-ink-soft">
                        {" "}
                        — shop allowance{" "}
                        {props.allowancesMl[part] == null
                          ? "drain and measure"
                          : formatVolume(props.allowancesMl[part] ?? 0, u.volume)}
                      </span>
                    </span>
                  </label>
                  {picked && (
                    <EntryInput
                      label={`Oil measured from the old ${REPLACED_PART_LABELS[part].toLowerCase()} (optional)`}
                      value={picked.measured}
                      onChange={(v) =>
                        setDraft((d) => ({
                          ...d,
                          parts: { ...d.parts, [part]: { count: picked.count, measured: v } },
                        }))
                      }
                      error={errorOf(`part-${part}`)}
                    />
                  )}
                </div>
              );
            })}
          </fieldset>
          {summary.addBack && (
            <ResultLine
              tone={summary.addBack.complete ? "info" : "bad"}
              sources={summary.addBack.lines.map((l) => l.source)}
              testId="oil-add-back"
            >
              Add back {formatVolume(summary.addBack.totalMl, u.volume)}:{" "}
              {summary.addBack.lines
                .map(
                  (l) =>
                    `${l.label} ${l.volumeMl == null ? "(to measure)" : formatVolume(l.volumeMl, u.volume)}`,
                )
                .join(", ")}
              . {summary.addBack.warnings.join(" ")}
            </ResultLine>
          )}
          {!summary.addBack && (
            <p className="text-ink-soft">
              Enter the oil drained during recovery (step 2) to see how much to add back.
            </p>
          )}
          <EntryInput
            label="Oil type added"
            inputMode="text"
            value={t.oilAddedType}
            onChange={(v) => setText("oilAddedType", v)}
            error={errorOf("oilAddedType")}
          />
          {f("oilAddedMl", "Oil added", volHint)}
          {summary.oilAddedSentence && (
            <ResultLine
              tone={Math.abs(summary.oilAddedDeltaMl ?? 0) <= 5 ? "good" : "bad"}
              sources={["common practice — an oil injector reads to about 5 mL"]}
            >
              {summary.oilAddedSentence}
            </ResultLine>
          )}
          {summary.oilWarnings.map((w) => (
            <ResultLine key={w.id} tone="bad" sources={[w.source]}>
              {w.text}
            </ResultLine>
          ))}
        </div>
      );
    case "recharge":
      return (
        <div className="space-y-4">
          {f(
            "targetG",
            "Target charge",
            summary.target
              ? `Leave empty to charge to ${formatMass(summary.target.targetG, u.mass)} (from the ${summary.target.basis === "label" ? "label" : summary.target.basis === "spec_table" ? "spec table" : "maker's revised figure"}).`
              : massHint,
          )}
          {f("chargedG", "Charged mass (machine display)", massHint)}
          <CylinderSelect
            label="Charged from cylinder"
            value={draft.chargeCylinderId}
            choices={props.cylinders.filter((c) => c.kind !== "recovery")}
            onChange={(id) => setDraft((d) => ({ ...d, chargeCylinderId: id }))}
            error={errorOf("chargeCylinderId")}
            massUnit={u.mass}
          />
          {summary.charge && (
            <ResultLine
              tone={summary.charge.within ? "good" : "bad"}
              sources={[summary.charge.source]}
              testId="charge-check"
            >
              {summary.charge.sentence}
            </ResultLine>
          )}
        </div>
      );
    case "final":
      return (
        <div className="space-y-4">
          <p className="text-ink-soft">
            The performance reading after the recharge, taken as before the work:{" "}
            {PERFORMANCE_TEST_CONDITIONS}.
          </p>
          <div className="grid grid-cols-2 gap-3">
            {f("finalAmbientC", "Ambient temperature", tempHint)}
            {f("finalVentC", "Centre vent temperature", tempHint)}
            {f("finalHighKpaGauge", "High side (gauge)", gaugeHint)}
            {f("finalLowKpaGauge", "Low side (gauge)", gaugeHint)}
          </div>
          <div>
            <label htmlFor="record-notes" className="field-label">
              Notes for the record (optional)
            </label>
            <textarea
              id="record-notes"
              rows={3}
              className="field-input py-2"
              value={t.notes}
              onChange={(e) => setText("notes", e.target.value)}
            />
          </div>
        </div>
      );
  }
}
