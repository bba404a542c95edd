import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getCurrentUser } from "@/app/_server/auth";
import { AccountGroups } from "@/components/account/account-groups";
import { RequestResetForm } from "@/components/auth/password-reset-forms";
import { PageHeading } from "@/components/ui/page-heading";
import { Panel } from "@/components/ui/panel";

export const metadata: Metadata = { title: "Account" };

export default async function AccountPage() {
  const user = await getCurrentUser();
  if (!user) redirect("/sign-in?callbackUrl=/account");
  return (
    <div className="mx-auto max-w-4xl px-6 py-10">
      <PageHeading title="Account" lead="Who you are in Vierbein and the groups you belong to." />
      <div className="grid gap-6 md:grid-cols-2">
        <Panel title="Profile" id="profile-title">
          <dl className="space-y-2 text-sm">
            <div>
              <dt className="text-ink-muted">Name</dt>
              <dd className="font-medium">{user.name || "—"}</dd>
            </div>
            <div>
              <dt className="text-ink-muted">E-mail</dt>
              <dd className="font-medium">{user.email}</dd>
            </div>
          </dl>
        </Panel>
        <Panel title="Your groups" id="account-groups-title">
          <AccountGroups />
        </Panel>
        <Panel title="Change your password" id="password-title" className="md:col-span-2">
          <p className="mb-3 text-sm text-ink-soft">We e-mail you a link; the change happens when you open it.</p>
          <RequestResetForm initialEmail={user.email} />
        </Panel>
      </div>
    </div>
  );
}
