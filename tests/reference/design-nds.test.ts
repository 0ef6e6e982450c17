import { describe, expect, it } from "vitest";
import { nds, ndsColumnParameter } from "@/lib/solve/design";

describe("NDS 2018 §3.7.1 column parameter c", () => {
  it("is 0.8 sawn, 0.85 round poles, 0.9 glulam", () => {
    expect(ndsColumnParameter.sawn).toBe(0.8); // Source: NDS 2018 §3.7.1
    expect(ndsColumnParameter.round).toBe(0.85); // Source: NDS 2018 §3.7.1
    expect(ndsColumnParameter.glulam).toBe(0.9); // Source: NDS 2018 §3.7.1
  });
});

describe("NDS 2018 Eq. 3.7-1 by hand", () => {
  it("Fc* = 1000 psi, E'min = 580 000 psi, le = 96 in, d = 5.5 in, sawn", () => {
    const r = nds.columnStability({ FcStar: 1000, EminPrime: 580000, le: 96, d: 5.5, c: "sawn" });
    expect(r.slenderness).toBeCloseTo(17.45, 2); // Source: 96 / 5.5 (closed form)
    expect(r.FcE).toBeCloseTo(1564.9, 1); // Source: NDS 2018 §3.7.1, 0.822 × 580 000 / 17.45² (closed form)
    expect(r.Cp).toBeCloseTo(0.8197, 4); // Source: NDS 2018 Eq. 3.7-1 (closed form)
    expect(r.FcPrime).toBeCloseTo(819.7, 1); // Source: NDS 2018 §3.7.1, Fc' = Fc* Cp (closed form)
  });

  it("FcE = Fc*, c = 0.8 gives Cp = 1.25 − √0.3125", () => {
    // le/d chosen so that 0.822 E'min/(le/d)² = Fc*.
    const EminPrime = 1000 / 0.822;
    const r = nds.columnStability({ FcStar: 1000, EminPrime: EminPrime * 100, le: 10, d: 1, c: 0.8 });
    expect(r.Cp).toBeCloseTo(0.690983, 6); // Source: NDS 2018 Eq. 3.7-1, (1+1)/1.6 − √(1.25² − 1/0.8) (closed form)
  });

  it("holds le/d to 50", () => {
    expect(nds.columnStability({ FcStar: 1000, EminPrime: 500000, le: 50, d: 1, c: "sawn" }).slendernessOk).toBe(true); // Source: NDS 2018 §3.7.1.4
    expect(nds.columnStability({ FcStar: 1000, EminPrime: 500000, le: 50.01, d: 1, c: "sawn" }).slendernessOk).toBe(false); // Source: NDS 2018 §3.7.1.4
  });
});
