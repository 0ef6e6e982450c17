/**
 * A small bar of demand over capacity, drawn to a tick at 1.0. Past 1.0 the
 * bar fills, turns to hatching and gets an overflow arrow, so an
 * overstressed member stands out without relying on colour. Decorative: the
 * figure beside it carries the value for screen readers.
 */
export function UtilizationBar({ utilization }: { utilization: number }) {
  const over = utilization > 1;
  const fill = Math.max(0, Math.min(1, Number.isFinite(utilization) ? utilization : 0));
  return (
    <span aria-hidden="true" className="relative inline-flex h-2.5 w-16 items-center border border-rule-strong bg-paper-sunk align-middle">
      <span
        className={over ? "h-full bg-compression" : "h-full bg-verdigris"}
        style={{
          width: `${fill * 100}%`,
          backgroundImage: over ? "repeating-linear-gradient(135deg, transparent 0 2px, rgba(255,255,255,0.55) 2px 4px)" : undefined,
        }}
      />
      {over && <span className="absolute -right-2.5 text-[10px] leading-none text-compression">▸</span>}
    </span>
  );
}
