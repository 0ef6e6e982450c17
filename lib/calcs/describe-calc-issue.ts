import type { CalcIssue } from "../solve";

/**
 * A problem the package graph found on a calc, as the message shown on that
 * calc: a broken reference, a cycle, or a calc it waits on.
 */
export function describeCalcIssue(issue: CalcIssue): string {
  switch (issue.kind) {
    case "broken": {
      const reference = issue.reference ?? "";
      const [label, value] = reference.split(".", 2);
      if (value === "model" && /has no value model$/.test(issue.message)) return `Broken reference: ${label} is not a Truss or Combinations calc, so it has no truss to read.`;
      if (value === "model" || value === undefined) return `Broken reference: ${issue.message}.`;
      return `Broken reference ${reference}: ${issue.message}.`;
    }
    case "cycle":
      return `Circular reference: ${issue.path?.join(" → ") ?? issue.message}. A calc cannot depend on its own results.`;
    case "blocked":
      return issue.message;
    case "failed":
      return issue.message;
  }
}

/** The message on a calc waiting on others that have problems. */
export function describeBlocked(labels: string[]): string {
  const list = labels.length === 1 ? labels[0] : `${labels.slice(0, -1).join(", ")} and ${labels[labels.length - 1]}`;
  return `Waiting on ${list}, which ${labels.length === 1 ? "has" : "have"} a problem to fix first.`;
}
