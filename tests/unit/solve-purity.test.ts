import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

/** The engineering core runs in the browser and on the server alike: it may import only itself and pure packages. */
const root = path.resolve("lib/solve");
const files: string[] = [];
const walk = (d: string) => {
  for (const n of readdirSync(d)) {
    const f = path.join(d, n);
    if (statSync(f).isDirectory()) walk(f);
    else if (/\.tsx?$/.test(n)) files.push(f);
  }
};
walk(root);

const allowedPackages = new Set(["zod", "mathjs", "katex"]);

function imports(src: string): string[] {
  return [...src.matchAll(/(?:import|export)\s[^;]*?from\s+["']([^"']+)["']|import\(\s*["']([^"']+)["']\s*\)/g)].map((m) => m[1] ?? m[2]);
}

describe("lib/solve stays pure", () => {
  it("has source files to check", () => {
    expect(files.length).toBeGreaterThan(10);
  });

  for (const f of files) {
    it(`${path.relative(root, f)} imports nothing from app, components, db, lib/report, Node or a framework`, () => {
      for (const spec of imports(readFileSync(f, "utf8"))) {
        if (spec.startsWith(".")) {
          const target = path.resolve(path.dirname(f), spec);
          expect(target.startsWith(root), `${spec} leaves lib/solve`).toBe(true);
        } else {
          expect(spec.startsWith("@/"), `${spec}: use relative imports inside lib/solve`).toBe(false);
          expect(allowedPackages.has(spec.split("/")[0]), `${spec} is not a pure dependency`).toBe(true);
        }
      }
    });
  }
});
