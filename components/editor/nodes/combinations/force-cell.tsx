import { forceSenseText } from "./force-sense-text";
import { formatFigure } from "./format-figure";

/**
 * A signed axial force in a table cell, with tension or compression in words
 * beside it: the sign convention (tension positive) never has to be remembered.
 */
export function ForceCell({ value, combination }: { value: number; combination?: string }) {
  const sense = forceSenseText(value);
  const tone = sense === "tension" ? "text-tension" : sense === "compression" ? "text-compression" : "text-ink-faint";
  return (
    <td className="text-right">
      <span className="pp-num" data-value={value}>
        {formatFigure(value)}
      </span>{" "}
      <span className={`text-xs ${tone}`}>{sense === "tension" ? "T" : sense === "compression" ? "C" : "–"}</span>
      <span className="sr-only"> ({sense})</span>
      {combination && <span className="block text-xs text-ink-soft">{combination}</span>}
    </td>
  );
}
