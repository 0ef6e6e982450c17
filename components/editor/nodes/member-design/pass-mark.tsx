/**
 * PASS ✓ or FAIL ✕: a word and a shape as well as a colour, and a heavier
 * frame on a failure, so the result reads the same in grey print.
 */
export function PassMark({ pass }: { pass: boolean }) {
  return pass ? (
    <span className="inline-flex items-center gap-1 whitespace-nowrap rounded-sm border border-verdigris px-1.5 py-0.5 text-xs font-semibold text-verdigris-dark" data-pass="true">
      PASS <span aria-hidden="true">✓</span>
    </span>
  ) : (
    <span className="inline-flex items-center gap-1 whitespace-nowrap rounded-sm border-2 border-compression bg-compression-light px-1.5 py-0.5 text-xs font-bold text-compression" data-pass="false">
      FAIL <span aria-hidden="true">✕</span>
    </span>
  );
}
