"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { useMutation, useQuery } from "@tanstack/react-query";
import { clsx } from "clsx";
import { Check } from "lucide-react";
import type { CreateCaseInput, CreateCaseResponse, NewVehicleInput } from "@/lib/contracts/cases";
import { apiFetch, ApiError } from "@/lib/queries/api-fetch";
import { vehicleChoicesQuery } from "@/lib/queries/vehicles";
import { EXPANSION_DEVICE_LABELS } from "@/lib/vehicles/expansion-devices";
import { NewVehicleFields, type NewVehicleDraft } from "./new-vehicle-fields";
import { COMPLAINT_PICKS, withPick } from "./complaint-picks";

export function NewCaseForm() {
  const router = useRouter();
  const [search, setSearch] = useState("");
  const [picked, setPicked] = useState<number | "new" | null>(null);
  const [complaint, setComplaint] = useState("");
  const [draft, setDraft] = useState<NewVehicleDraft | null>(null);
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const { data: vehicles = [], isFetching } = useQuery(vehicleChoicesQuery(search.trim()));

  const create = useMutation({
    mutationFn: (body: CreateCaseInput) =>
      apiFetch<CreateCaseResponse>("/api/cases", { method: "POST", body }),
    onSuccess: ({ case: c }) => router.push(`/cases/${c.id}/interview`),
    onError: (error) =>
      setErrors(
        error instanceof ApiError
          ? { _: [error.message], ...(error.fieldErrors ?? {}) }
          : { _: ["No answer from the server; what you typed is kept. Try again."] },
      ),
  });

  function submit(event: React.FormEvent) {
    event.preventDefault();
    setErrors({});
    if (picked === null) return setErrors({ vehicleId: ["Pick a vehicle or add one."] });
    if (picked === "new") {
      if (!draft) return setErrors({ vehicleId: ["Fill in the new vehicle."] });
      if (Object.keys(draft.problems).length) return setErrors(draft.problems);
      create.mutate({ newCustomer: draft.customer, newVehicle: draft.vehicle as NewVehicleInput, complaint });
    } else {
      create.mutate({ vehicleId: picked, complaint } as CreateCaseInput);
    }
  }

  const firstError = (key: string) => errors[key]?.[0];
  return (
    <form onSubmit={submit} noValidate className="space-y-6">
      <fieldset className="card">
        <legend className="px-1 text-xl font-bold">Which vehicle?</legend>
        <label htmlFor="vehicle-search" className="field-label mt-2">
          Find by plate, VIN, customer phone or name
        </label>
        <input
          id="vehicle-search"
          type="search"
          className="field-input"
          value={search}
          onChange={(e) => setSearch(e.target.value)}
          autoComplete="off"
          // The first thing done here: a phone number's digits or a plate find the vehicle.
          autoFocus
        />
        <ul className="mt-3 space-y-2" aria-busy={isFetching}>
          {vehicles.map((v) => (
            <li key={v.vehicleId}>
              <button
                type="button"
                aria-pressed={picked === v.vehicleId}
                onClick={() => setPicked(v.vehicleId)}
                className={clsx(
                  "flex min-h-glove w-full items-center gap-3 rounded-card border-2 p-3 text-left",
                  picked === v.vehicleId ? "border-glacier-600 bg-glacier-50" : "border-paper-line bg-paper",
                )}
              >
                <span className="flex-1">
                  <span className="block font-bold">{v.description}</span>
                  <span className="block text-ink-soft">
                    {[v.plate, v.customer, v.customerPhone].filter(Boolean).join(" · ")}
                  </span>
                  <span className="block text-sm text-ink-soft">
                    {v.refrigerant} · {EXPANSION_DEVICE_LABELS[v.expansionDevice]}
                    {v.electricCompressor ? " · electric compressor" : ""}
                  </span>
                </span>
                {picked === v.vehicleId && <Check aria-hidden className="h-6 w-6 text-glacier-600" />}
              </button>
            </li>
          ))}
          {vehicles.length === 0 && <li className="text-ink-soft">No vehicle matches “{search}”.</li>}
        </ul>
        <button
          type="button"
          className="btn-quiet mt-3 w-full"
          aria-pressed={picked === "new"}
          onClick={() => setPicked("new")}
        >
          A vehicle not listed here
        </button>
        {picked === "new" && (
          <NewVehicleFields
            onChange={setDraft}
            errors={errors}
            initialPhone={/^[\d\s()+.-]{3,}$/.test(search.trim()) ? search.trim() : ""}
          />
        )}
        {firstError("vehicleId") && <p className="field-error">{firstError("vehicleId")}</p>}
      </fieldset>

      <div className="card">
        <label htmlFor="complaint" className="field-label text-xl">
          The complaint, in the owner&apos;s words
        </label>
        <p id="complaint-picks-hint" className="text-sm text-ink-soft">
          Tap what the owner says, or write their own words.
        </p>
        <div className="my-2 flex flex-wrap gap-2" role="group" aria-label="Common complaints">
          {COMPLAINT_PICKS.map((pick) => (
            <button
              key={pick}
              type="button"
              className="min-h-touch rounded-full border-2 border-glacier-500 bg-paper px-3 text-left text-sm font-bold text-glacier-900"
              onClick={() => setComplaint((c) => withPick(c, pick))}
            >
              {pick}
            </button>
          ))}
        </div>
        <textarea
          id="complaint"
          rows={3}
          className="field-input py-2"
          value={complaint}
          onChange={(e) => setComplaint(e.target.value)}
          aria-invalid={firstError("complaint") ? true : undefined}
          aria-describedby={firstError("complaint") ? "complaint-error" : undefined}
        />
        {firstError("complaint") && (
          <p id="complaint-error" className="field-error">
            {firstError("complaint")}
          </p>
        )}
      </div>

      {firstError("_") && (
        <p
          role="alert"
          className="rounded-card border-2 border-ember-500 bg-ember-50 p-3 font-bold text-ember-700"
        >
          {firstError("_")}
        </p>
      )}
      <button type="submit" className="btn-primary min-h-glove w-full text-lg" disabled={create.isPending}>
        {create.isPending ? "Opening the case…" : "Start the interview"}
      </button>
    </form>
  );
}
