import Link from "next/link";
import { SignOutButton } from "./sign-out-button";
import { Wordmark } from "./wordmark";

export type AppHeaderProps = { name: string; email: string; firm: string; firmRole: "admin" | "member"; showDevMail: boolean };

export function AppHeader({ name, email, firm, firmRole, showDevMail }: AppHeaderProps) {
  return (
    <header className="border-b border-rule bg-paper-raised">
      <div className="mx-auto flex max-w-6xl items-center gap-6 px-6 py-2.5">
        <Link href="/projects" className="no-underline hover:no-underline" aria-label="Panelpoint — projects">
          <Wordmark />
        </Link>
        <nav className="flex gap-4 text-sm" aria-label="Main">
          <Link href="/projects">Projects</Link>
          <Link href="/firm">Firm</Link>
          <Link href="/account">Account</Link>
          {showDevMail && <Link href="/dev/mail">Captured mail</Link>}
        </nav>
        <div className="ml-auto flex items-center gap-3 text-sm" data-testid="signed-in-as">
          <span className="text-right leading-tight">
            <span className="block font-medium">{name}</span>
            <span className="block text-xs text-ink-faint">
              {email} · {firm} · {firmRole === "admin" ? "firm admin" : "firm member"}
            </span>
          </span>
          <SignOutButton />
        </div>
      </div>
    </header>
  );
}
