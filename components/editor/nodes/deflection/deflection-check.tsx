import type { DeflectionView } from "@/lib/calcs/deflection/deflection-view";
import { formatFigure, formatQuantity } from "../combinations/format-figure";
import { PassMark } from "../member-design/pass-mark";

/**
 * The verdict: the deflection with its sense, the allowable span / ratio,
 * PASS or FAIL in words, and the agreement with the stiffness solution,
 * which guards against a wrong unit-load case or a mistyped section.
 */
export function DeflectionCheck({ view }: { view: DeflectionView }) {
  const u = view.units.deflection;
  const diff = view.stiffnessValue === null ? null : view.value - view.stiffnessValue;
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm" aria-label="Deflection check">
      <dt className="text-ink-soft">
        δ<sub>{view.direction}</sub> at {view.joint}, {view.loadCase}
      </dt>
      <dd>
        <span className="pp-num font-semibold" data-testid="deflection-value" data-value={view.value} data-unit={u}>
          {formatQuantity(view.value, u)}
        </span>{" "}
        <span className="text-ink-soft">({view.sense})</span>
      </dd>
      <dt className="text-ink-soft">Allowable, span / {formatFigure(view.ratio)}</dt>
      <dd className="pp-num">
        {formatFigure(view.span)} {view.units.length} / {formatFigure(view.ratio)} = {formatQuantity(view.allowable, u)}
      </dd>
      <dt className="text-ink-soft">|δ| / allowable</dt>
      <dd className="flex items-center gap-2">
        <span className="pp-num" data-testid="deflection-utilization" data-value={view.utilization}>
          {view.utilization.toFixed(3)}
        </span>
        <PassMark pass={view.pass} />
        <span className="text-xs text-ink-soft">{view.pass ? "within the limit" : "exceeds the limit"}</span>
      </dd>
      <dt className="text-ink-soft">Stiffness method</dt>
      <dd data-testid="deflection-agreement" data-agrees={view.agrees === null ? "unknown" : String(view.agrees)}>
        {view.stiffnessValue === null || diff === null ? (
          <span className="text-ink-faint">not available for this truss</span>
        ) : (
          <>
            <span className="pp-num">{formatQuantity(view.stiffnessValue, u)}</span>
            <span className="text-ink-soft"> · difference </span>
            <span className="pp-num">{formatQuantity(diff, u, 2)}</span>{" "}
            {view.agrees ? <span className="text-verdigris-dark">✓ agrees</span> : <span className="font-semibold text-compression">✕ disagrees: check the sections and the case</span>}
          </>
        )}
      </dd>
    </dl>
  );
}
