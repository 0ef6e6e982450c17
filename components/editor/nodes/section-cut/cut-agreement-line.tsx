import type { SectionCutView } from "@/lib/calcs/section-cut/section-cut-view";

export type CutAgreementLineProps = { view: SectionCutView };

/** The section's verdict against the full solution of the truss it reads, in words and with a mark. */
export function CutAgreementLine({ view }: CutAgreementLineProps) {
  return view.agrees ? (
    <p className="text-sm" data-testid="cut-agreement" data-agrees="true">
      ✓ Agrees with the stiffness solution of {view.truss} within round-off.
    </p>
  ) : (
    <p className="text-sm font-medium text-compression" data-testid="cut-agreement" data-agrees="false" role="alert">
      ✕ Differs from the stiffness solution of {view.truss}: check the cut, the side kept and the loads (differences in the table above).
    </p>
  );
}
