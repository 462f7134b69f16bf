export default function OwnerLinkNotFound() {
  return (
    <main className="mx-auto max-w-xl p-6">
      <div className="card">
        <h1 className="text-2xl font-bold">This link is no longer valid</h1>
        <p className="mt-2">
          The shop may have replaced it with a new one, or it has expired. Ask the shop to send you a new
          link.
        </p>
      </div>
    </main>
  );
}
