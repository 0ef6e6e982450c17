import { useMathVisible } from "./math-visibility";
import { renderTex } from "./render-tex";

export type TexProps = {
  latex: string;
  /** Display (block, centred) rather than inline math. */
  display?: boolean;
  className?: string;
};

/**
 * Typeset math. The HTML comes from KaTeX with `trust` off, which escapes the
 * source, so setting it as inner HTML is safe. A line that does not parse shows
 * a clear box with the message and the source instead of breaking the calc.
 */
export function Tex({ latex, display = false, className }: TexProps) {
  const visible = useMathVisible();
  // Off screen: keep the element and its source (for find and copy), typeset once scrolled into view.
  if (!visible) return display ? <div className={className} data-tex-deferred="">{latex}</div> : <span className={className} data-tex-deferred="">{latex}</span>;
  const result = renderTex(latex, display);
  if (!result.ok) return <TexError latex={latex} message={result.message} display={display} />;
  const Tag = display ? "div" : "span";
  return <Tag className={className} data-tex="" dangerouslySetInnerHTML={{ __html: result.html }} />;
}

export type TexErrorProps = { latex: string; message: string; display?: boolean };

/** The error box: words for the problem, and the source so the author can find it. */
export function TexError({ latex, message, display = false }: TexErrorProps) {
  const Tag = display ? "div" : "span";
  return (
    <Tag data-tex-error="" className={`${display ? "flex" : "inline-flex"} flex-col gap-0.5 rounded-sm border border-caution bg-caution-light px-2 py-1 text-xs text-caution`}>
      <span className="font-medium">Cannot typeset this line: {message}</span>
      <code className="whitespace-pre-wrap break-all font-mono text-ink">{latex}</code>
    </Tag>
  );
}
