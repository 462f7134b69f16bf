import Link from "next/link";

export default function Forbidden() {
  return (
    <main className="mx-auto max-w-xl p-6">
      <div className="card">
        <h1 className="text-2xl font-bold">Not open to your role</h1>
        <p className="mt-2">
          This page belongs to another role in the shop. If you need it, ask the shop owner to change your
          role.
        </p>
        <Link href="/cases" className="btn-primary mt-4">
          Back to cases
        </Link>
      </div>
    </main>
  );
}
