const labels: Record<string, string> = { draft: "Draft", in_check: "In check", checked: "Checked", issued: "Issued" };

export function StatusTag({ status }: { status: string }) {
  return <span className="pp-tag" data-status={status}>{labels[status] ?? status}</span>;
}
