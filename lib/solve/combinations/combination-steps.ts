import { escapeTex, texNum, texNumParen, texQty } from "../latex";
import type { Step } from "../types";
import type { StandardRules } from "./standard-rules";
import { defaultPsi0 } from "./psi-factors";
import { texText } from "./tex-text";
import type { Combination, LoadAction } from "./types";

/** The opening lines: the set used, its partial factors, alternatives, and what it leaves out. */
export function headerSteps(set: StandardRules, actions: LoadAction[]): Step[] {
  const steps: Step[] = [{ latex: texText(set.title), text: set.title }];
  if (set.permanentKind === "G") {
    const psi = actions
      .filter((a) => a.kind !== "G")
      .map((a) => `\\psi_{0,\\mathrm{${escapeTex(a.id)}}} = ${texNum(a.psi0 ?? defaultPsi0[a.kind as keyof typeof defaultPsi0])}`);
    steps.push({
      latex: `\\gamma_{G,sup} = 1.35,\\ \\gamma_{G,inf} = 1.00,\\ \\gamma_Q = 1.5,\\ \\xi = 0.85${psi.length ? `;\\quad ${psi.join(",\\ ")}` : ""}`,
      text: "Partial factors, EN 1990 Table A1.2(B); combination factors \u03c80, Table A1.1 unless entered.",
    });
  } else if (actions.some((a) => a.psi0 !== undefined)) {
    steps.push({ latex: texText("psi0 is not used by ASCE/SEI 7 combinations"), text: "\u03c80 entered on an action is ignored: ASCE/SEI 7 factors are fixed." });
  }
  const byKind = new Map<string, string[]>();
  for (const a of actions) if (a.kind !== set.permanentKind) byKind.set(a.kind, [...(byKind.get(a.kind) ?? []), a.id]);
  for (const [kind, ids] of byKind) {
    if (ids.length < 2) continue;
    const text = `${ids.join(", ")} are alternatives of ${kind} and enter a combination one at a time.`;
    steps.push({ latex: texText(text), text });
  }
  for (const note of set.notes) steps.push({ latex: texText(note), text: note });
  steps.push({
    latex: texText("Relieving variable actions are left out; permanent actions at the favourable factor where that governs."),
    text: "Each combination is evaluated for the maximum and for the minimum.",
  });
  return steps;
}

/** One line per combination: factors, numbers substituted, result. */
export function combinationStep(c: Combination, values: Record<string, number>, order: string[], unit: string): Step {
  const ids = order.filter((id) => c.factors[id] !== 0);
  const label = c.name.slice(0, c.name.indexOf(")") + 1);
  if (!ids.length) return { latex: `${texText(label)}\\quad 0`, text: c.source };
  const symbolic = ids.map((id) => `${factorTex(c.factors[id])}\\mathrm{${escapeTex(id)}}`).join(" + ");
  const numeric = ids.map((id) => `${factorTex(c.factors[id], true)}${unit ? texQtyParen(values[id], unit) : texNumParen(values[id])}`).join(" + ");
  return { latex: `${texText(label)}\\quad ${symbolic} = ${numeric} = ${texQty(c.value, unit)}`, text: c.source };
}

/** The extremes and the combinations that give them. */
export function extremeSteps(max: Combination, min: Combination, unit: string): Step[] {
  return [
    { latex: `\\max = ${texQty(max.value, unit)}\\quad ${texText(max.name)}`, text: `Maximum by ${max.name}.` },
    { latex: `\\min = ${texQty(min.value, unit)}\\quad ${texText(min.name)}`, text: `Minimum by ${min.name}.` },
  ];
}

function factorTex(f: number, times = false): string {
  if (f === 1) return "";
  return times ? `${texNum(f)} \\times ` : `${texNum(f)}\\,`;
}

function texQtyParen(x: number, unit: string): string {
  return x < 0 ? `(${texQty(x, unit)})` : texQty(x, unit);
}
