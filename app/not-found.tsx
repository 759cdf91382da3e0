import Link from "next/link";

export default function NotFound() {
  return (
    <main className="mx-auto max-w-xl px-6 py-24">
      <p className="text-xs font-semibold uppercase tracking-[0.18em] text-copper-deep">Not found</p>
      <h1 className="mt-2 text-2xl font-semibold">There is nothing at this address</h1>
      <p className="mt-3 text-ink-soft">
        The page may have moved, or it belongs to a project you are not a member of.
      </p>
      <Link href="/projects" className="mt-6 inline-block text-copper-deep underline underline-offset-4">
        Back to your projects
      </Link>
    </main>
  );
}
