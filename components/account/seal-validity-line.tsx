import type { SealProfileView } from "@/lib/seals/get-seal-profile";

/** Whether the seal can be used to issue today, in words (never colour alone). */
export function SealValidityLine({ seal }: { seal: SealProfileView }) {
  const v = seal.validity;
  if (v.valid) return <p className="text-sm text-ink" data-testid="seal-validity">Valid until <span className="pp-num">{v.expiresOn}</span></p>;
  const expired = seal.expiresOn !== null && v.reason.startsWith("your seal expired");
  return (
    <p className="rounded-sm bg-caution-light px-2 py-1 text-sm text-caution" data-testid="seal-validity" role="status">
      {expired ? <>Expired on <span className="pp-num">{seal.expiresOn}</span> — renew to issue</> : <>Not valid yet: {v.reason}.</>}
    </p>
  );
}
