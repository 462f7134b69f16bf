/** The button under a paged list that fetches its next page. */
export function MoreButton({
  hasNextPage,
  isFetchingNextPage,
  fetchNextPage,
  label,
}: {
  hasNextPage: boolean;
  isFetchingNextPage: boolean;
  fetchNextPage: () => unknown;
  label: string;
}) {
  if (!hasNextPage) return null;
  return (
    <button
      type="button"
      className="btn-quiet mt-3 w-full"
      onClick={() => fetchNextPage()}
      disabled={isFetchingNextPage}
    >
      {isFetchingNextPage ? "Loading…" : label}
    </button>
  );
}
