/**
 * One audit entry in words, for the package's audit trail. Unknown actions
 * are shown by their code rather than hidden, so nothing recorded goes missing
 * from the page when a new action is added before its wording.
 */
export function describeAuditEntry(action: string, data: Record<string, unknown>): string {
  const s = (k: string) => (typeof data[k] === "string" || typeof data[k] === "number" ? String(data[k]) : "");
  switch (action) {
    case "package.create": return `Created the package “${s("title")}”`;
    case "package.rename": return `Renamed the package from “${s("from")}” to “${s("to")}”`;
    case "package.delete": return `Deleted the package “${s("title")}”`;
    case "checker.assign": return "Assigned the checker";
    case "package.submit": return "Submitted the package for check";
    case "package.in_check": return `Package back in check (${s("checked")} of ${s("total")} calcs checked, ${s("openRemarks")} open remarks)`;
    case "package.checked": return `Package checked (${s("checked")} of ${s("total")} calcs, no open remark)`;
    case "package.draft": return "Package back to draft";
    case "calc.checked": return `Marked ${s("label")} checked`;
    case "calc.returned": return `Returned ${s("label")}`;
    case "remark.create": return data.calcId ? "Raised a remark on a calc" : "Raised a remark on the text";
    case "remark.reply": return `Replied to a remark (${s("from")} → ${s("to")})`;
    case "remark.close": return `Closed a remark (was ${s("from")})`;
    case "revision.issue": return `Issued Rev ${s("label")} (fingerprint ${s("fingerprint").slice(0, 12)}…)`;
    case "revision.start_next": return "Started the next revision";
    case "plan_review.record": return `Recorded plan-review comment${Array.isArray(data.numbers) && data.numbers.length === 1 ? "" : "s"} ${Array.isArray(data.numbers) ? data.numbers.join(", ") : ""} on Rev ${s("revision")}`;
    case "plan_review.update": return `Updated plan-review comment ${s("number")}`;
    case "plan_review.delete": return `Removed plan-review comment ${s("number")} on Rev ${s("revision")}`;
    case "figure.upload": return "Uploaded a figure";
    case "export.create": return `Asked for a ${s("format").toUpperCase()} export`;
    case "export.done": return `Export finished (${s("format").toUpperCase()})`;
    case "export.fail": return `Export failed: ${s("error")}`;
    default: return action;
  }
}
