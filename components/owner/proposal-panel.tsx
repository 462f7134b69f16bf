"use client";

import { useState } from "react";
import type { ShopProposalView } from "@/lib/contracts/owner-summary";
import { REPAIRS, type RepairId } from "@/lib/repairs/catalog";
import { proposeRepairs } from "@/lib/queries/owner-summary";
import { useCaseAction } from "./use-case-action";
import { useShopTime } from "@/components/shell/shop-clock";

/** The repair the shop proposes to the owner, and the owner's answer when it comes. */
export function ProposalPanel({
  caseId,
  mayAct,
  proposal,
  suggested,
}: {
  caseId: number;
  mayAct: boolean;
  proposal: ShopProposalView | null;
  suggested: RepairId[];
}) {
  const when = useShopTime();
  const [chosen, setChosen] = useState<Set<string>>(
    () => new Set(proposal ? proposal.repairs.map((r) => r.id) : suggested),
  );
  const [price, setPrice] = useState("");
  const [currency, setCurrency] = useState("USD");
  const [note, setNote] = useState("");
  const [priceError, setPriceError] = useState<string | null>(null);
  const propose = useCaseAction(() => {
    const trimmed = price.trim().replace(/,/g, "");
    const priceMinor = trimmed === "" ? null : Math.round(Number(trimmed) * 100);
    return proposeRepairs(caseId, {
      repairIds: REPAIRS.filter((r) => chosen.has(r.id)).map((r) => r.id),
      priceMinor,
      currency: currency.trim().toUpperCase(),
      note,
    });
  });
  return (
    <section aria-labelledby="proposal-heading" className="card space-y-3">
      <h2 id="proposal-heading" className="text-lg font-bold">
        Repair proposal to the owner
      </h2>
      {proposal ? (
        <div className="space-y-1" data-testid="current-proposal">
          <p>
            Proposed by {proposal.proposedBy}, {when(proposal.proposedAt)}:{" "}
            {proposal.repairs.map((r) => r.title).join("; ")}
            {proposal.price ? ` for ${proposal.price}` : ""}.
          </p>
          {proposal.answer ? (
            <p role="status" className="font-bold" data-testid="owner-answer">
              Owner {proposal.answer.answer === "approved" ? "approved" : "declined"} on{" "}
              {when(proposal.answer.answeredAt)}
              {proposal.answeredViaLinkId ? ` through link ${proposal.answeredViaLinkId}` : ""}
              {proposal.answer.note ? `: “${proposal.answer.note}”` : "."}
            </p>
          ) : (
            <p data-testid="owner-answer">Waiting for the owner&apos;s answer.</p>
          )}
        </div>
      ) : (
        <p>No repair proposed yet.</p>
      )}
      {mayAct && (
        <form
          className="space-y-3"
          onSubmit={(e) => {
            e.preventDefault();
            const trimmed = price.trim().replace(/,/g, "");
            if (trimmed !== "" && !(Number(trimmed) >= 0)) {
              setPriceError("Enter the price as a number, such as 480 or 480.50.");
              return;
            }
            setPriceError(null);
            propose.mutate(undefined);
          }}
        >
          <fieldset>
            <legend className="field-label">Repairs</legend>
            <ul className="space-y-1">
              {REPAIRS.map((r) => (
                <li key={r.id}>
                  <label className="flex min-h-touch items-center gap-2">
                    <input
                      type="checkbox"
                      className="h-6 w-6 shrink-0"
                      checked={chosen.has(r.id)}
                      onChange={(e) =>
                        setChosen((prev) => {
                          const next = new Set(prev);
                          if (e.target.checked) next.add(r.id);
                          else next.delete(r.id);
                          return next;
                        })
                      }
                    />
                    {r.tradeLabel}
                  </label>
                </li>
              ))}
            </ul>
          </fieldset>
          <div className="grid grid-cols-[1fr_6rem] gap-2">
            <div>
              <label htmlFor="proposal-price" className="field-label">
                Price (optional)
              </label>
              <input
                id="proposal-price"
                inputMode="decimal"
                className="field-input"
                value={price}
                aria-invalid={priceError ? true : undefined}
                aria-describedby={priceError ? "proposal-price-error" : undefined}
                onChange={(e) => setPrice(e.target.value)}
              />
            </div>
            <div>
              <label htmlFor="proposal-currency" className="field-label">
                Currency
              </label>
              <input
                id="proposal-currency"
                className="field-input uppercase"
                maxLength={3}
                value={currency}
                onChange={(e) => setCurrency(e.target.value)}
              />
            </div>
          </div>
          {priceError && (
            <p id="proposal-price-error" className="field-error">
              {priceError}
            </p>
          )}
          <div>
            <label htmlFor="proposal-note" className="field-label">
              Note for the owner (optional)
            </label>
            <textarea
              id="proposal-note"
              rows={2}
              className="field-input py-2"
              value={note}
              onChange={(e) => setNote(e.target.value)}
            />
          </div>
          {propose.error && (
            <p role="alert" className="field-error">
              {propose.error}
            </p>
          )}
          <button type="submit" className="btn-primary w-full" disabled={propose.isPending}>
            {proposal ? "Replace the proposal" : "Propose to the owner"}
          </button>
        </form>
      )}
    </section>
  );
}
