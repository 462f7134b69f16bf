import Link from "next/link";

export default function NotFound() {
  return (
    <main className="mx-auto max-w-xl p-6">
      <div className="card">
        <h1 className="text-2xl font-bold">Nothing here</h1>
        <p className="mt-2">This page does not exist, or it belongs to another shop.</p>
        <Link href="/cases" className="btn-primary mt-4">
          Back to cases
        </Link>
      </div>
    </main>
  );
}
