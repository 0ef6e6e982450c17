"use client";

import { signOut } from "next-auth/react";

export function SignOutButton() {
  async function out() {
    // Clear the session first, then leave by a full page load so no signed-in state lingers in memory.
    await signOut({ redirect: false });
    window.location.assign("/sign-in");
  }
  return (
    <button type="button" className="pp-btn-quiet" onClick={out}>
      Sign out
    </button>
  );
}
