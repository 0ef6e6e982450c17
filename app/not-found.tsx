import Link from "next/link";

export default function NotFound() {
  return (
    <div className="mx-auto max-w-md px-6 py-24 text-center">
      <h1 className="mb-2">Not found</h1>
      <p className="mb-4 text-sm text-ink-soft">There is nothing here, or it is not yours to see.</p>
      <Link href="/projects">Back to projects</Link>
    </div>
  );
}
