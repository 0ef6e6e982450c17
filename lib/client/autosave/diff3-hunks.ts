import { lcsMatches } from "./lcs-matches";

/** A run of the three lists: `stable` when all three hold the same keys, else what each side has there. */
export type Diff3Hunk<T> = { stable: boolean; base: T[]; mine: T[]; theirs: T[] };

/**
 * Splits three versions of a list into stable runs (the same keys in base,
 * mine and theirs) and the changed stretches between them, as diff3 does for
 * lines. `keyOf` decides identity; items with equal keys may still differ in
 * content, which the caller compares.
 */
export function diff3Hunks<T>(base: T[], mine: T[], theirs: T[], keyOf: (item: T) => string): Diff3Hunk<T>[] {
  const baseKeys = base.map(keyOf);
  const toMine = lcsMatches(baseKeys, mine.map(keyOf));
  const toTheirs = lcsMatches(baseKeys, theirs.map(keyOf));
  const hunks: Diff3Hunk<T>[] = [];
  let o = 0;
  let a = 0;
  let b = 0;
  for (;;) {
    let run = 0;
    while (o + run < base.length && toMine[o + run] === a + run && toTheirs[o + run] === b + run) run++;
    if (run > 0) {
      hunks.push({ stable: true, base: base.slice(o, o + run), mine: mine.slice(a, a + run), theirs: theirs.slice(b, b + run) });
      o += run;
      a += run;
      b += run;
      continue;
    }
    // The next base item both sides kept ends the changed stretch.
    let next = o;
    while (next < base.length && (toMine[next] === -1 || toTheirs[next] === -1)) next++;
    const endA = next < base.length ? toMine[next] : mine.length;
    const endB = next < base.length ? toTheirs[next] : theirs.length;
    if (next > o || endA > a || endB > b) {
      hunks.push({ stable: false, base: base.slice(o, next), mine: mine.slice(a, endA), theirs: theirs.slice(b, endB) });
    }
    if (next >= base.length) return hunks;
    o = next;
    a = endA;
    b = endB;
  }
}
