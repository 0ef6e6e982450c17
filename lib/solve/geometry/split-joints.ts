import type { TrussModel } from "../types";

/**
 * The connected parts of the truss once `removed` members are taken out,
 * each listed in model order. A joint with no remaining member is a part of
 * its own, so a cut that strands a joint is seen as more than two parts.
 */
export function splitJoints(model: TrussModel, removed: ReadonlySet<string>): string[][] {
  const neighbours = new Map<string, string[]>(model.joints.map((j) => [j.id, []]));
  for (const m of model.members) {
    if (removed.has(m.id)) continue;
    neighbours.get(m.start)?.push(m.end);
    neighbours.get(m.end)?.push(m.start);
  }
  const part = new Map<string, number>();
  let parts = 0;
  for (const j of model.joints) {
    if (part.has(j.id)) continue;
    const stack = [j.id];
    part.set(j.id, parts);
    while (stack.length) {
      const here = stack.pop() as string;
      for (const next of neighbours.get(here) ?? []) {
        if (!part.has(next)) {
          part.set(next, parts);
          stack.push(next);
        }
      }
    }
    parts += 1;
  }
  const out: string[][] = Array.from({ length: parts }, () => []);
  for (const j of model.joints) out[part.get(j.id) as number].push(j.id);
  return out;
}
