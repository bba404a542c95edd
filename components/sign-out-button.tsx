"use client";

import { signOut } from "next-auth/react";
import { useState } from "react";

export function SignOutButton() {
  const [busy, setBusy] = useState(false);
  return (
    <button
      type="button"
      disabled={busy}
      onClick={() => {
        setBusy(true);
        void signOut({ callbackUrl: "/" });
      }}
      className="rounded border border-paper-edge px-3 py-1 text-ink-soft hover:bg-paper-deep hover:text-ink disabled:opacity-55"
    >
      {busy ? "Signing out…" : "Sign out"}
    </button>
  );
}
