import fc from "fast-check";
import katex from "katex";
import { describe, expect, it } from "vitest";
import { evaluateFormulas } from "@/lib/solve/formula";

const renders = (latex: string) => katex.renderToString(latex, { throwOnError: true });

describe("formula steps: symbol = expression = numbers = result", () => {
  it("writes the beam moment with symbols, then numbers with units, then the result", () => {
    const r = evaluateFormulas({ source: "w = 12 kN/m\nL = 6 m\nM = w*L^2/8" });
    const m = r.lines[2];
    if (m.error) throw new Error(m.error.message);
    expect(m.expressionLatex).toBe("\\frac{w\\,L^{2}}{8}");
    expect(m.substitutedLatex).toBe("\\frac{12\\,\\mathrm{kN/m} \\cdot \\left(6\\,\\mathrm{m}\\right)^{2}}{8}");
    expect(m.resultLatex).toBe("54\\,\\mathrm{kN\\cdot m}");
    expect(m.step.latex).toBe(`M = ${m.expressionLatex} = ${m.substitutedLatex} = ${m.resultLatex}`);
    expect(m.step.text).toBe("M = w*L^2/8 = 54 kN·m");
  });

  it("does not repeat a value that is written as it is shown", () => {
    expect(evaluateFormulas({ source: "w = 12 kN/m" }).steps[0].latex).toBe("w = 12\\,\\mathrm{kN/m}");
    expect(evaluateFormulas({ source: "L = 20 ft" }).steps[0].latex).toBe("L = 20\\,\\mathrm{ft} = 6.096\\,\\mathrm{m}");
  });

  it("puts negative values in parentheses where they are multiplied, raised or subtracted", () => {
    const r = evaluateFormulas({ source: "F = -40 kN\nx = 2*F\ny = F^2\nz = 1 kN - F" });
    expect(r.steps[1].latex).toContain("2 \\cdot \\left(-40\\,\\mathrm{kN}\\right)");
    expect(r.steps[2].latex).toContain("\\left(-40\\,\\mathrm{kN}\\right)^{2}");
    expect(r.steps[3].latex).toContain("1\\,\\mathrm{kN} - \\left(-40\\,\\mathrm{kN}\\right)");
  });

  it("typesets the functions and dotted references of other calcs", () => {
    const r = evaluateFormulas({
      source: "a = sqrt(T1.A_g)\nb = abs(T1.F_U1L2)\nc = max(a, 2 mm)\nd = sin(30 deg)",
      scope: { "T1.A_g": { value: 400, unit: "mm^2" }, "T1.F_U1L2": { value: -12.5, unit: "kN" } },
    });
    expect(r.errors).toEqual([]);
    expect(r.steps[0].latex).toBe("a = \\sqrt{\\mathrm{T1}{.}A_{\\mathrm{g}}} = \\sqrt{400\\,\\mathrm{mm^{2}}} = 0.02\\,\\mathrm{m}");
    expect(r.steps[1].latex).toContain("\\left|\\mathrm{T1}{.}F_{\\mathrm{U1L2}}\\right|");
    expect(r.steps[2].latex).toContain("\\max\\left(a,\\ 2\\,\\mathrm{mm}\\right)");
    expect(r.steps[3].latex).toContain("\\sin\\left(30\\,\\mathrm{deg}\\right)");
  });

  it("keeps the author's parentheses and drops those a fraction bar makes clear", () => {
    const r = evaluateFormulas({ source: "a = 2\nb = 3\nc = (a + b)/(a - b)\nd = a*(b + 1)" });
    expect(r.steps[2].latex).toMatch(/^c = \\frac\{a \+ b\}\{a - b\} = /);
    expect(r.steps[3].latex).toMatch(/^d = a\\,\\left\(b \+ 1\\right\) = /);
  });

  it("produces LaTeX that KaTeX renders for a realistic member check", () => {
    const source = [
      "P_u = 310 kN  # from T1",
      "F_y = 345 MPa",
      "E = 200 GPa",
      "A_g = 3600 mm^2",
      "r = 45 mm",
      "L_c = 2.5 m",
      "lambda = L_c/r",
      "F_e = pi^2*E/lambda^2",
      "F_cr = 0.658^(F_y/F_e)*F_y",
      "phiP_n = 0.9*F_cr*A_g",
      "U = P_u/phiP_n",
      "theta = 35 deg",
      "V = P_u*cos(theta) - -2 kN",
      "x = 1.5e-7 m -> mm",
    ].join("\n");
    const r = evaluateFormulas({ source });
    expect(r.errors).toEqual([]);
    for (const line of r.lines) {
      if (line.error) continue;
      for (const latex of [line.expressionLatex, line.substitutedLatex, line.resultLatex, line.step.latex]) expect(() => renders(latex)).not.toThrow();
    }
  });

  it("always yields finite values and renderable steps for arbitrary arithmetic on quantities", () => {
    const unit = fc.constantFrom("kN", "m", "mm", "MPa", "mm^2", "kN/m", "ft", "kip", "");
    const op = fc.constantFrom("+", "-", "*", "/", "^");
    const num = fc.double({ min: -1e4, max: 1e4, noNaN: true, noDefaultInfinity: true }).map((x) => String(Math.round(x * 1000) / 1000));
    const term = fc.tuple(num, unit).map(([n, u]) => (n.startsWith("-") ? `(${n} ${u})` : `${n} ${u}`).trim());
    fc.assert(
      fc.property(fc.array(fc.tuple(term, op, term), { minLength: 1, maxLength: 6 }), (rows) => {
        const source = rows.map(([a, o, b], i) => `v${i} = ${a} ${o} ${o === "^" ? "2" : b}`).join("\n");
        const r = evaluateFormulas({ source });
        for (const line of r.lines) {
          if (line.error) {
            expect(line.error.message).toMatch(/on line \d+$/);
            continue;
          }
          expect(Number.isFinite(line.value)).toBe(true);
          renders(line.step.latex);
        }
      }),
      { numRuns: 200 },
    );
  });
});
