"use client";

import Link from "next/link";
import { useEffect, useRef, useState } from "react";
import { ApiError, fetchJson } from "@/components/data/api-client";
import { Notice } from "@/components/ui/notice";

type State = { kind: "working" } | { kind: "done" } | { kind: "failed"; message: string };

/** Confirms the address as soon as the page opens; the ref keeps a second effect run from spending the token twice. */
export function VerifyEmailStatus({ token, email }: { token: string; email: string | null }) {
  const [state, setState] = useState<State>({ kind: "working" });
  const started = useRef(false);

  useEffect(() => {
    if (started.current) return;
    started.current = true;
    fetchJson("/api/auth/verify", { method: "POST", json: email ? { token, email } : { token } })
      .then(() => setState({ kind: "done" }))
      .catch((error: unknown) =>
        setState({
          kind: "failed",
          message: error instanceof ApiError ? error.message : "The address could not be confirmed. Try again.",
        }),
      );
  }, [token, email]);

  if (state.kind === "working") return <p role="status">Confirming your e-mail address…</p>;
  if (state.kind === "failed")
    return (
      <div className="space-y-3">
        <Notice kind="problem">{state.message}</Notice>
        <p className="text-sm text-ink-soft">Links work once and expire. Sign up again or sign in with an e-mailed link to get a new one.</p>
      </div>
    );
  return (
    <div className="space-y-3">
      <Notice kind="success">Your e-mail address is confirmed.</Notice>
      <p>
        <Link href="/sign-in">Sign in</Link> to continue.
      </p>
    </div>
  );
}
