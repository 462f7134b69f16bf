import type { Metadata } from "next";
import { Suspense } from "react";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { requireUser } from "@/lib/auth/guard";
import { getQueryClient } from "@/lib/query-client";
import { casebookKeys } from "@/lib/queries/casebook";
import { readCasebookParams } from "@/lib/casebook/url";
import { searchCasebook } from "@/lib/server/casebook/search";
import { casebookFacets } from "@/lib/server/casebook/facets";
import { CasebookView } from "@/components/casebook/casebook-view";

export const metadata: Metadata = { title: "Casebook" };

export default async function CasebookPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const user = await requireUser("casebook:search");
  const raw = Object.fromEntries(
    Object.entries(await searchParams).map(([key, value]) => [key, Array.isArray(value) ? value[0] : value]),
  );
  // The first screen arrives with its results; later changes go through TanStack Query.
  const { query, params } = readCasebookParams(raw);
  const queryClient = getQueryClient();
  const [results, facets] = await Promise.all([
    searchCasebook({ shopId: user.shopId, query }),
    casebookFacets({ shopId: user.shopId, filters: query }),
  ]);
  queryClient.setQueryData(casebookKeys.search(params), results);
  queryClient.setQueryData(casebookKeys.facets(params), facets);
  return (
    <div className="space-y-4">
      <h1 className="text-2xl font-bold">Casebook</h1>
      <p className="text-ink-soft">
        Every case of the shop: what the owner said, what the readings pointed to, and what the repair
        confirmed.
      </p>
      <HydrationBoundary state={dehydrate(queryClient)}>
        <Suspense fallback={<p className="card">Loading the casebook…</p>}>
          <CasebookView />
        </Suspense>
      </HydrationBoundary>
    </div>
  );
}
