import type { Metadata } from "next";
import { SignInForm } from "@/components/auth/sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ callbackUrl?: string; email?: string }> }) {
  const { callbackUrl, email } = await searchParams;
  // Only paths inside the app: a crafted link must not bounce a person to another site.
  const next = callbackUrl && callbackUrl.startsWith("/") && !callbackUrl.startsWith("//") ? callbackUrl : "/projects";
  return (
    <>
      <h1 className="mb-4">Sign in</h1>
      <SignInForm next={next} email={email} />
    </>
  );
}
