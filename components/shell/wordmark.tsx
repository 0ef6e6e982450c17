/** Panelpoint's mark: a panel point where a chord and two webs meet, drawn as a node on a line. */
export function Wordmark({ large = false }: { large?: boolean }) {
  const size = large ? 28 : 20;
  return (
    <span className="inline-flex items-center gap-2 text-ink">
      <svg width={size} height={size} viewBox="0 0 24 24" aria-hidden="true">
        <path d="M2 19 H22" stroke="currentColor" strokeWidth="1.6" />
        <path d="M12 19 L5 6 M12 19 L19 6" stroke="#2f6f6a" strokeWidth="1.6" fill="none" />
        <circle cx="12" cy="19" r="2.6" fill="#f6f4ef" stroke="currentColor" strokeWidth="1.6" />
      </svg>
      <span className={`${large ? "text-2xl" : "text-base"} font-semibold tracking-tight`}>Panelpoint</span>
    </span>
  );
}
