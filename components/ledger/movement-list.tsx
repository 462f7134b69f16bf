"use client";

import { useState } from "react";
import Link from "next/link";
import { useInfiniteQuery, useMutation, useQueryClient } from "@tanstack/react-query";
import { clsx } from "clsx";
import type { MovementDto, ReversalResponse } from "@/lib/contracts/ledger";
import { apiFetch, ApiError } from "@/lib/queries/api-fetch";
import { ledgerKeys, movementsQuery } from "@/lib/queries/ledger";
import { type MassUnit, formatMassGrouped } from "@/lib/units";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { MoreButton } from "@/components/ui/more-button";
import { useShopRecordTime } from "@/components/shell/shop-clock";
import { MOVEMENT_WORDS } from "./words";

export interface LedgerViewer {
  massUnit: MassUnit;
  canWrite: boolean;
  /** owners and seniors cancel any line; a technician only their own */
  canCancelAny: boolean;
  userId: string;
}

function amount(mv: MovementDto, massUnit: MassUnit) {
  return `${formatMassGrouped(Math.abs(mv.massG), massUnit)}${mv.type === "adjustment" && mv.massG < 0 ? " out" : ""}`;
}

/** The ledger's lines, newest first, a page at a time; a wrong line is cancelled with a reason. */
export function MovementList({ viewer }: { viewer: LedgerViewer }) {
  const queryClient = useQueryClient();
  const { data, fetchNextPage, hasNextPage, isFetchingNextPage } = useInfiniteQuery(movementsQuery());
  const movements = data?.pages.flatMap((p) => p.movements) ?? [];
  const shopDateTime = useShopRecordTime();
  const [target, setTarget] = useState<MovementDto | null>(null);
  const [status, setStatus] = useState<string | null>(null);
  const cancel = useMutation({
    mutationFn: ({ id, reason }: { id: number; reason: string }) =>
      apiFetch<ReversalResponse>(`/api/ledger/movements/${id}/reversal`, {
        method: "POST",
        body: { reason },
      }),
    onSuccess: ({ correction, original }) => {
      setTarget(null);
      setStatus(
        `Line #${original.id} is cancelled by correction #${correction.id}. Both stay in the ledger.`,
      );
      return queryClient.invalidateQueries({ queryKey: ledgerKeys.all });
    },
  });
  const cancelError = cancel.error
    ? cancel.error instanceof ApiError
      ? cancel.error.message
      : "No answer from the server; nothing was cancelled. Try again."
    : null;

  const mayCancel = (mv: MovementDto) =>
    viewer.canWrite &&
    !mv.reversesId &&
    !mv.reversedById &&
    !mv.serviceRecordId &&
    (viewer.canCancelAny || mv.technicianId === viewer.userId);

  return (
    <>
      <p className="mb-2 text-ink-soft">
        Every recovery and recharge a service record saves is posted here. Nothing is ever erased: a wrong
        line is cancelled by a correction that stays beside it, with the reason.
      </p>
      {movements.length === 0 && <p className="text-ink-soft">Nothing posted yet.</p>}
      <ul className="divide-y divide-paper-line" data-testid="movement-list">
        {movements.map((mv) => (
          <li
            key={mv.id}
            className={clsx("py-2", (mv.reversedById || mv.reversesId) && "text-ink-soft")}
            data-testid={`movement-${mv.id}`}
          >
            <p>
              <span className="font-bold">
                {mv.reversesId ? `Correction cancelling #${mv.reversesId}: ` : ""}
                {MOVEMENT_WORDS[mv.type]} {mv.cylinderLabel}
              </span>{" "}
              · {amount(mv, viewer.massUnit)} · {mv.refrigerant}
            </p>
            <p className="text-sm">
              #{mv.id} · {shopDateTime(mv.occurredAt)} · {mv.technician}
              {mv.reversedById ? ` · cancelled by #${mv.reversedById}` : ""}
              {mv.destination ? ` · to ${mv.destination}` : ""}
              {mv.note ? ` · ${mv.reversesId ? "reason: " : ""}${mv.note}` : ""}
            </p>
            {mv.caseId && (
              <p className="text-sm">
                <Link
                  className="inline-flex min-h-touch items-center underline"
                  href={`/cases/${mv.caseId}/service`}
                >
                  {mv.serviceRecordId ? `From the service record of case ${mv.caseId}` : `Case ${mv.caseId}`}
                </Link>
                {mv.serviceRecordId && !mv.reversesId && !mv.reversedById
                  ? " · change the figure there and the ledger follows"
                  : ""}
              </p>
            )}
            {mayCancel(mv) && (
              <button
                type="button"
                className="btn-quiet mt-1"
                onClick={() => {
                  cancel.reset();
                  setStatus(null);
                  setTarget(mv);
                }}
                aria-label={`Cancel line #${mv.id} with a correction`}
              >
                Cancel with a correction…
              </button>
            )}
          </li>
        ))}
      </ul>
      <MoreButton
        hasNextPage={hasNextPage}
        isFetchingNextPage={isFetchingNextPage}
        fetchNextPage={fetchNextPage}
        label="Show older lines"
      />
      <p role="status" className="mt-2 min-h-6 font-bold">
        {status}
      </p>
      <ConfirmDialog
        open={target !== null}
        title={target ? `Cancel line #${target.id}?` : "Cancel a line?"}
        confirmLabel="Post the correction"
        danger
        reason={{
          label: "Why is this line wrong?",
          hint: "For example: typed 5 kg, the scale showed 500 g. The reason is kept with the correction.",
        }}
        busy={cancel.isPending}
        error={cancelError}
        onConfirm={(reason) => target && cancel.mutate({ id: target.id, reason })}
        onCancel={() => setTarget(null)}
      >
        {target && (
          <>
            <p>
              <strong>
                {MOVEMENT_WORDS[target.type]} {target.cylinderLabel} · {amount(target, viewer.massUnit)}
              </strong>{" "}
              on {shopDateTime(target.occurredAt)} by {target.technician}.
            </p>
            <p>
              The line stays in the ledger. A correction that cancels it is posted now, and the cylinder and
              the monthly report follow. This cannot itself be cancelled.
            </p>
          </>
        )}
      </ConfirmDialog>
    </>
  );
}
