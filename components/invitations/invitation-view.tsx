"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { signIn, signOut } from "next-auth/react";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { newPasswordField } from "@/components/auth/fields";
import { fetchJson } from "@/components/data/api-client";
import { roleDescriptions, roleLabels, type Role } from "@/components/data/roles";
import { Button, buttonClasses } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { PageHeading } from "@/components/ui/page-heading";
import { TextField } from "@/components/ui/text-field";

export type InvitationSummary = {
  groupName: string;
  role: Role;
  email: string;
  invitedByName: string | null;
  expiresAt: string;
  accountExists: boolean;
};

type Joined = { groupId: string; role: Role; alreadyMember: boolean };

const newAccountSchema = z.object({
  name: z.string().trim().min(1, "Enter your name.").max(100, "At most 100 characters."),
  password: newPasswordField,
});

/** Accepting an invitation: join when signed in as the invited address, sign in first, or make the account here. */
export function InvitationView({ token, invitation, signedInAs }: { token: string; invitation: InvitationSummary | null; signedInAs: string | null }) {
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const path = `/invitations/${token}`;

  if (!invitation) {
    return (
      <>
        <PageHeading title="Invitation" />
        <Notice kind="problem">This invitation link is not valid any more: it was used, withdrawn or has expired. Ask the group lead for a new one.</Notice>
        <p className="mt-4">
          <Link href="/dashboard">Go to the dashboard</Link>
        </p>
      </>
    );
  }

  const join = async (body: Record<string, string> = {}): Promise<Joined> => fetchJson<Joined>(`/api/invitations/${token}`, { method: "POST", json: body });
  const goToGroup = (joined: Joined) => router.push(`/groups/${joined.groupId}`);

  const acceptSignedIn = async () => {
    setBusy(true);
    setProblem(null);
    try {
      goToGroup(await join());
    } catch (error) {
      setProblem((error as Error).message);
      setBusy(false);
    }
  };

  return (
    <>
      <PageHeading
        title={`Join ${invitation.groupName}`}
        lead={
          <>
            {invitation.invitedByName ? `${invitation.invitedByName} invites` : "You are invited"} <strong>{invitation.email}</strong> to join as{" "}
            <strong>{roleLabels[invitation.role]}</strong> ({roleDescriptions[invitation.role]}).
          </>
        }
      />
      {problem && <Notice kind="problem">{problem}</Notice>}
      <div className="mt-4 space-y-4">
        {signedInAs === invitation.email ? (
          <Button onClick={() => void acceptSignedIn()} disabled={busy}>
            {busy ? "Joining…" : "Join the group"}
          </Button>
        ) : signedInAs ? (
          <>
            <Notice kind="problem">
              You are signed in as {signedInAs}, but this invitation is for {invitation.email}. Sign out, then open the link again.
            </Notice>
            <Button tone="quiet" onClick={() => void signOut({ callbackUrl: path })}>
              Sign out
            </Button>
          </>
        ) : invitation.accountExists ? (
          <p>
            <Link className={buttonClasses()} href={`/sign-in?callbackUrl=${encodeURIComponent(path)}`}>
              Sign in as {invitation.email} to join
            </Link>
          </p>
        ) : (
          <NewAccountForm email={invitation.email} join={join} onJoined={goToGroup} />
        )}
        <p className="text-xs text-ink-muted">The link works once, until {new Date(invitation.expiresAt).toUTCString()}.</p>
      </div>
    </>
  );
}

/** No account uses the invited address yet: choose a name and password; opening the mailed link already proved the address. */
function NewAccountForm({ email, join, onJoined }: { email: string; join: (body: Record<string, string>) => Promise<Joined>; onJoined: (joined: Joined) => void }) {
  const [problem, setProblem] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<z.infer<typeof newAccountSchema>>({ resolver: zodResolver(newAccountSchema) });

  const onSubmit = handleSubmit(async ({ name, password }) => {
    setProblem(null);
    try {
      const joined = await join({ name, password });
      const result = await signIn("credentials", { email, password, redirect: false });
      if (result?.error) throw new Error("Your account is ready, but signing in failed; sign in with your new password.");
      onJoined(joined);
    } catch (error) {
      setProblem((error as Error).message);
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Make your account and join" className="space-y-3">
      <p className="text-sm text-ink-soft">No Vierbein account uses {email} yet. Choose your name and a password to make one; you join the group at once.</p>
      {problem && <Notice kind="problem">{problem}</Notice>}
      <TextField label="Your name" autoComplete="name" error={formState.errors.name?.message} {...register("name")} />
      <TextField label="Password" type="password" autoComplete="new-password" hint="At least 8 characters." error={formState.errors.password?.message} {...register("password")} />
      <Button type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Joining…" : "Make my account and join"}
      </Button>
    </form>
  );
}
