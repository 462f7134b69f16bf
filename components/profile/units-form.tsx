"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useForm, useWatch } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { clsx } from "clsx";
import { profileInputSchema, type ProfileInput, type ProfileResponse } from "@/lib/contracts/profile";
import { apiFetch, ApiError } from "@/lib/queries/api-fetch";
import { profileKeys, profileQuery } from "@/lib/queries/profile";
import {
  READER_QUANTITIES,
  UNIT_CHOICES,
  UNIT_LABELS,
  unitsOfSystem,
  type ReaderQuantity,
} from "@/lib/units";

const QUANTITY_LABELS: Record<ReaderQuantity, string> = {
  pressure: "Pressure (gauges)",
  temperature: "Temperature",
  mass: "Refrigerant mass",
  volume: "Oil volume",
  vacuum: "Vacuum",
};

// Offered as a list so nobody has to know language tags; any other valid tag can be typed.
const LOCALES = [
  "en-US",
  "en-CA",
  "en-GB",
  "en-AU",
  "fr-CA",
  "es-MX",
  "es-ES",
  "de-DE",
  "fr-FR",
  "it-IT",
  "pt-BR",
  "nl-NL",
  "pl-PL",
];

function inputOf(profile: ProfileResponse): ProfileInput {
  return {
    system: profile.choice.system ?? null,
    pressure: profile.choice.pressure ?? null,
    temperature: profile.choice.temperature ?? null,
    mass: profile.choice.mass ?? null,
    volume: profile.choice.volume ?? null,
    vacuum: profile.choice.vacuum ?? null,
    locale: profile.locale,
  };
}

function Choices({
  legend,
  options,
  value,
  onChange,
}: {
  legend: string;
  options: { value: string | null; label: string }[];
  value: string | null;
  onChange: (value: string | null) => void;
}) {
  return (
    <fieldset>
      <legend className="field-label">{legend}</legend>
      <div className="flex flex-wrap gap-2">
        {options.map((o) => (
          <button
            key={o.value ?? "inherit"}
            type="button"
            aria-pressed={value === o.value}
            onClick={() => onChange(o.value)}
            className={clsx(
              "min-h-glove min-w-touch rounded-card border-2 px-3 py-2 font-bold",
              value === o.value
                ? "border-glacier-700 bg-glacier-700 text-white"
                : "border-ink-muted bg-paper text-ink",
            )}
          >
            {o.label}
          </button>
        ))}
      </div>
    </fieldset>
  );
}

/** The person's own units and locale: set once, used by every field and every number they read. */
export function UnitsForm() {
  const { data: profile } = useQuery(profileQuery());
  if (!profile) return <p>Loading your settings…</p>;
  return <LoadedUnitsForm profile={profile} />;
}

function LoadedUnitsForm({ profile }: { profile: ProfileResponse }) {
  const queryClient = useQueryClient();
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<ProfileInput>({
    defaultValues: inputOf(profile),
    resolver: zodResolver(profileInputSchema),
  });
  const values = useWatch({ control: form.control }) as ProfileInput;
  const save = useMutation({
    mutationFn: (body: ProfileInput) => apiFetch<ProfileResponse>("/api/me/profile", { method: "PUT", body }),
    onSuccess: (saved) => {
      queryClient.setQueryData(profileKeys.mine(), saved);
      form.reset(inputOf(saved));
      setMessage("Saved. Every field you open from now on starts in these units.");
    },
    onError: (error) => setMessage(error instanceof ApiError ? error.message : "Not saved: try again."),
  });
  const system = values.system ?? profile.shopSystem;
  const systemUnits = unitsOfSystem(system);
  const set = (key: keyof ProfileInput, value: string | null) =>
    form.setValue(key, value as never, { shouldDirty: true, shouldValidate: true });

  return (
    <form noValidate className="card space-y-5" onSubmit={form.handleSubmit((body) => save.mutate(body))}>
      <Choices
        legend="Unit system"
        value={values.system}
        onChange={(v) => set("system", v)}
        options={[
          { value: null, label: `The shop's (${profile.shopSystem})` },
          { value: "metric", label: "Metric" },
          { value: "imperial", label: "Imperial" },
        ]}
      />
      <p className="text-ink-soft">Read one quantity differently, if your gauges do:</p>
      {READER_QUANTITIES.map((quantity) => (
        <Choices
          key={quantity}
          legend={QUANTITY_LABELS[quantity]}
          value={values[quantity]}
          onChange={(v) => set(quantity, v)}
          options={[
            { value: null, label: `As the system (${UNIT_LABELS[systemUnits[quantity]]})` },
            ...(UNIT_CHOICES[quantity] as readonly string[]).map((u) => ({
              value: u,
              label: UNIT_LABELS[u] ?? u,
            })),
          ]}
        />
      ))}
      <div>
        <label htmlFor="profile-locale" className="field-label">
          How you write numbers
        </label>
        <input
          id="profile-locale"
          list="profile-locales"
          className="field-input"
          placeholder="This device's language"
          autoComplete="off"
          aria-describedby="profile-locale-hint"
          {...form.register("locale", {
            setValueAs: (v: string | null) => (v == null || v.trim() === "" ? null : v.trim()),
          })}
        />
        <datalist id="profile-locales">
          {LOCALES.map((l) => (
            <option key={l} value={l} />
          ))}
        </datalist>
        <p id="profile-locale-hint" className="mt-1 text-sm text-ink-soft">
          A language tag such as en-US or de-DE. It decides whether 1,200 means twelve hundred or asks you.
        </p>
        {form.formState.errors.locale && (
          <p className="field-error" role="alert">
            {form.formState.errors.locale.message}
          </p>
        )}
      </div>
      <div className="flex items-center gap-3">
        <button type="submit" className="btn-primary min-h-glove" disabled={save.isPending}>
          Save my units
        </button>
        <p role="status" className="text-ink-soft">
          {message}
        </p>
      </div>
    </form>
  );
}
