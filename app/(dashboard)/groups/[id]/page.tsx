import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getCurrentUser } from "@/app/_server/auth";
import { GroupSettingsView } from "@/components/groups/group-settings-view";

export const metadata: Metadata = { title: "Group settings" };

export default async function GroupSettingsPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await getCurrentUser();
  if (!user) redirect(`/sign-in?callbackUrl=/groups/${encodeURIComponent(id)}`);
  return <GroupSettingsView groupId={id} currentUserId={user.id} />;
}
