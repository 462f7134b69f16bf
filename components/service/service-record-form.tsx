"use client";

import { useMemo, useState } from "react";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { clsx } from "clsx";
import { SERVICE_STEP_OF_FIELD, SERVICE_STEPS, type ServiceStepId } from "@/lib/contracts/service-records";
import { ApiError, apiErrorText } from "@/lib/queries/api-fetch";
import { saveServiceRecord, serviceRecordKeys } from "@/lib/queries/service-record";
import { ledgerKeys } from "@/lib/queries/ledger";
import { cautionsFor } from "@/lib/service/cautions";
import { sayServiceRecordSummary, summariseServiceRecord } from "@/lib/service/record-summary";
import { useReaderUnits } from "@/components/shell/reader-units";
import type { ReplacedPartId } from "@/lib/service/oil";
import { readVolumeMl } from "@/lib/service/entry";
import { CautionsList } from "@/components/cautions/cautions-list";
import { type Draft, type TextField, draftFromRecord, inputFromDraft, readDraft } from "./draft";
import type { ServiceRecordFormProps } from "./form-props";
import { StepFields } from "./step-fields";

export const STEP_TITLES: Record<ServiceStepId, string> = {
  identify: "Identification",
  recovery: "Recovery",
  evacuation: "Evacuation and hold",
  oil: "Oil",
  recharge: "Recharge",
  final: "Final reading",
};

export function ServiceRecordForm(props: ServiceRecordFormProps) {
  const { caseId, serviceCase, units } = props;
  const queryClient = useQueryClient();
  const [draft, setDraft] = useState<Draft>(() =>
    draftFromRecord(props.record, units, {
      labelChargeG: serviceCase.labelChargeG,
      oilType: serviceCase.oilType,
      figures: serviceCase.figures,
    }),
  );
  const [version, setVersion] = useState(props.record?.version ?? 0);
  const [step, setStep] = useState<ServiceStepId>(
    (props.record?.step as ServiceStepId | undefined) ?? "identify",
  );
  const [serverErrors, setServerErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<{ tone: "ok" | "error"; text: string } | null>(null);
  const refrigerant = serviceCase.refrigerant ?? "R-134a";

  const read = useMemo(() => readDraft(draft, units), [draft, units]);
  const spec = props.specChoices.find((s) => s.id === draft.specEntryId) ?? null;
  const { say } = useReaderUnits();
  const summary = useMemo(
    () =>
      sayServiceRecordSummary(
        summariseServiceRecord(
          {
            ...read.values,
            refrigerant,
            specChargeG: spec?.labelChargeG ?? null,
            specOilType: spec?.oilType ?? serviceCase.oilType,
            specTotalOilMl: spec?.totalOilMl ?? null,
            oilPulled: draft.oilPulled,
            partsReplaced: Object.entries(draft.parts).map(([part, p]) => {
              const measured = readVolumeMl(p?.measured ?? "", units.volume);
              return {
                part: part as ReplacedPartId,
                count: p?.count ?? 1,
                ...("value" in measured ? { measuredMl: measured.value } : {}),
              };
            }),
            oilAddedType: draft.text.oilAddedType,
          },
          {
            altitudeM: units.altitudeM,
            allowancesMl: props.allowancesMl,
            compressorDrive: serviceCase.electricCompressor ? "electric" : "belt",
          },
        ),
        say,
      ),
    [draft, read, spec, refrigerant, serviceCase, units, props.allowancesMl, say],
  );

  const save = useMutation({
    mutationFn: (nextStep: ServiceStepId) =>
      saveServiceRecord(caseId, inputFromDraft(draft, read, nextStep, version, units)),
    onSuccess: (result, nextStep) => {
      setVersion(result.record.version);
      setServerErrors({});
      const posted =
        result.posted > 0
          ? ` ${result.posted} ledger ${result.posted === 1 ? "entry" : "entries"} posted.`
          : "";
      setMessage({
        tone: result.markedWarnings.length ? "error" : "ok",
        text: `${STEP_TITLES[step]} saved.${posted}${result.markedWarnings.length ? ` ${result.markedWarnings.map(say).join(" ")}` : ""}`,
      });
      setStep(nextStep);
      void queryClient.invalidateQueries({ queryKey: serviceRecordKeys.forCase(caseId) });
      void queryClient.invalidateQueries({ queryKey: ledgerKeys.all });
    },
    onError: (error) => {
      if (error instanceof ApiError) {
        const said = apiErrorText(error, say);
        const mapped = Object.fromEntries(Object.entries(said.fieldErrors).filter(([, text]) => text));
        setServerErrors(mapped);
        // A field asked on another step is not on screen: say there which step asks for it.
        const elsewhere = Object.entries(mapped)
          .filter(([field]) => {
            const asked = SERVICE_STEP_OF_FIELD[field as keyof typeof SERVICE_STEP_OF_FIELD];
            return asked !== undefined && asked !== step;
          })
          .map(([field, text]) => {
            const asked = SERVICE_STEP_OF_FIELD[field as keyof typeof SERVICE_STEP_OF_FIELD];
            return `Step ${SERVICE_STEPS.indexOf(asked) + 1}, ${STEP_TITLES[asked]}: ${text}`;
          });
        setMessage({
          tone: "error",
          text: [said.message, ...elsewhere, "Nothing you typed was lost."].join(" "),
        });
      } else
        setMessage({
          tone: "error",
          text: "No answer from the server. Nothing you typed was lost; try again.",
        });
    },
  });

  const setText = (field: TextField, value: string) => {
    setDraft((d) => ({ ...d, text: { ...d.text, [field]: value } }));
    setServerErrors((e) => ({ ...e, [field]: "" }));
  };
  const errorOf = (field: string) => read.errors[field] || serverErrors[field] || undefined;

  function submit(nextStep: ServiceStepId) {
    setMessage(null);
    if (Object.keys(read.errors).length > 0) {
      setMessage({
        tone: "error",
        text: "Some entries could not be read; they are marked below. Nothing was saved yet, and nothing you typed was lost.",
      });
      return;
    }
    save.mutate(nextStep);
  }

  const index = SERVICE_STEPS.indexOf(step);
  const next = SERVICE_STEPS[index + 1];
  const cautionStep = step === "final" ? "recharge" : step;
  return (
    <div className="space-y-4">
      <nav aria-label="Service record steps">
        <ol className="flex gap-2 overflow-x-auto pb-1">
          {SERVICE_STEPS.map((s, i) => (
            <li key={s}>
              <button
                type="button"
                aria-current={s === step ? "step" : undefined}
                onClick={() => setStep(s)}
                className={clsx(
                  "min-h-touch whitespace-nowrap rounded-card border-2 px-3 font-bold",
                  s === step ? "border-glacier-600 bg-glacier-600 text-white" : "border-paper-line bg-paper",
                )}
              >
                {i + 1}. {STEP_TITLES[s]}
              </button>
            </li>
          ))}
        </ol>
      </nav>
      <form
        className="card space-y-4"
        noValidate
        onSubmit={(e) => {
          e.preventDefault();
          submit(next ?? step);
        }}
      >
        <h2 className="text-xl font-bold">{STEP_TITLES[step]}</h2>
        <StepFields
          step={step}
          draft={draft}
          setDraft={setDraft}
          setText={setText}
          errorOf={errorOf}
          summary={summary}
          props={props}
        />
        <CautionsList
          heading="Before you go on"
          showHeading
          withSources
          foldNotices={false}
          cautions={cautionsFor({
            step: cautionStep,
            refrigerant,
            expansionDevice: serviceCase.expansionDevice ?? undefined,
            electricCompressor: serviceCase.electricCompressor,
          })}
        />
        {message && (
          <p
            role={message.tone === "error" ? "alert" : "status"}
            className={clsx(
              "rounded-card border-2 p-3 font-bold",
              message.tone === "error"
                ? "border-ember-500 bg-ember-50 text-ember-700"
                : "border-sound-500 bg-sound-50 text-sound-700",
            )}
          >
            {message.text}
          </p>
        )}
        {props.readOnlyReason === null ? (
          <button type="submit" className="btn-primary min-h-glove w-full text-lg" disabled={save.isPending}>
            {save.isPending
              ? "Saving…"
              : next
                ? `Save and go to ${STEP_TITLES[next].toLowerCase()}`
                : "Save the service record"}
          </button>
        ) : (
          <p className="text-ink-soft">{props.readOnlyReason}</p>
        )}
      </form>
    </div>
  );
}
