"use client";

import { useEffect, useMemo, useRef, useState } from "react";
import { useSearchParams } from "next/navigation";
import { useQuery } from "@tanstack/react-query";
import {
  casebookSearchString,
  readCasebookParams,
  withParams,
  type CasebookParams,
} from "@/lib/casebook/url";
import { casebookExportHref, casebookFacetsQuery, casebookSearchQuery } from "@/lib/queries/casebook";
import { CASEBOOK_EXPORT_MAX_ROWS } from "@/lib/contracts/casebook";
import { CasebookFilters } from "./casebook-filters";
import { CasebookResults } from "./casebook-results";

const TYPING_PAUSE_MS = 350;

/**
 * The casebook: one search box, the facets and the results. Everything that shapes the search lives in
 * the address, so a search can be bookmarked or sent to a colleague; the address changes without a
 * round trip to the server, and the data comes through TanStack Query.
 */
export function CasebookView() {
  const searchParams = useSearchParams();
  const read = useMemo(() => readCasebookParams(Object.fromEntries(searchParams)), [searchParams]);
  const params = read.params;
  const [text, setText] = useState(params.q ?? "");
  const typedRef = useRef(text);

  const go = (next: CasebookParams, mode: "push" | "replace" = "push") => {
    const url = `/casebook${casebookSearchString(next)}`;
    if (mode === "push") window.history.pushState(null, "", url);
    else window.history.replaceState(null, "", url);
  };

  // Typing settles into the address after a short pause; each key does not start a search.
  useEffect(() => {
    typedRef.current = text;
    const trimmed = text.trim();
    if (trimmed === (params.q ?? "")) return;
    const timer = setTimeout(() => go(withParams(params, { q: trimmed }), "replace"), TYPING_PAUSE_MS);
    return () => clearTimeout(timer);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [text]);
  // Back and forward bring their own words into the box.
  useEffect(() => {
    if ((params.q ?? "") !== typedRef.current.trim()) setText(params.q ?? "");
  }, [params.q]);

  const search = useQuery(casebookSearchQuery(params));
  const facets = useQuery(casebookFacetsQuery(params));
  const data = search.data;
  const exportCapped = (data?.total ?? 0) > CASEBOOK_EXPORT_MAX_ROWS;

  return (
    <div className="space-y-4">
      <form
        role="search"
        className="card space-y-2"
        onSubmit={(e) => {
          e.preventDefault();
          go(withParams(params, { q: text.trim() }));
        }}
      >
        <label htmlFor="casebook-q" className="field-label">
          Search the shop&apos;s cases
        </label>
        <div className="flex gap-2">
          <input
            id="casebook-q"
            type="search"
            className="field-input"
            value={text}
            onChange={(e) => setText(e.target.value)}
            autoComplete="off"
            enterKeyHint="search"
            aria-describedby="casebook-q-help"
          />
          <button type="submit" className="btn-primary">
            Search
          </button>
        </div>
        <p id="casebook-q-help" className="text-sm text-ink-soft">
          Looks through the complaint, the technician&apos;s and senior&apos;s notes, the conclusion and the
          confirmed repair.
        </p>
      </form>

      {read.refused.length > 0 && (
        <p role="status" className="card border-caution-500 bg-caution-50">
          Part of this address could not be read and was left out:{" "}
          {read.refused.map((r) => r.message).join(" ")}
        </p>
      )}

      <CasebookFilters params={params} facets={facets.data} onChange={(next) => go(next)} />

      <div className="flex flex-wrap items-center justify-between gap-2">
        <p role="status" aria-live="polite" className="font-bold" data-testid="casebook-count">
          {data
            ? `${data.total.toLocaleString("en")} ${data.total === 1 ? "case" : "cases"}`
            : search.isError
              ? ""
              : "Searching…"}
          {search.isFetching && data ? (
            <span className="ml-2 font-normal text-ink-soft">updating…</span>
          ) : null}
        </p>
        <a className="btn-quiet" href={casebookExportHref(params)} download>
          Export CSV{exportCapped ? ` (first ${CASEBOOK_EXPORT_MAX_ROWS.toLocaleString("en")})` : ""}
        </a>
      </div>
      {search.fetchStatus === "paused" ? (
        <p role="alert" className="card border-caution-500 bg-caution-50">
          No connection: the search runs again when it is back. The last results stay in view.
        </p>
      ) : (
        search.isError && (
          <p role="alert" className="card border-ember-500 text-ember-700">
            {search.error.message} {data ? "The last results stay in view." : ""}
          </p>
        )
      )}
      {data && <CasebookResults data={data} params={params} onChange={(next) => go(next)} />}
    </div>
  );
}
