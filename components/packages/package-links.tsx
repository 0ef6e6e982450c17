import Link from "next/link";

/** The package's other pages, shown under its title. */
export function PackageLinks({ projectId, packageId }: { projectId: string; packageId: string }) {
  const base = `/projects/${projectId}/packages/${packageId}`;
  return (
    <nav aria-label="Package pages" className="flex flex-wrap gap-3 text-sm">
      <Link className="text-verdigris-dark underline-offset-2 hover:underline" href={`${base}/compare`}>Compare revisions</Link>
      <Link className="text-verdigris-dark underline-offset-2 hover:underline" href={`${base}/plan-review`}>Plan-review comments</Link>
      <Link className="text-verdigris-dark underline-offset-2 hover:underline" href={`${base}/audit`}>Audit trail</Link>
    </nav>
  );
}
