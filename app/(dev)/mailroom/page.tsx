import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { mailroomEnabled } from "@/app/_server/mail";
import { MailroomView } from "@/components/mailroom/mailroom-view";
import { PageHeading } from "@/components/ui/page-heading";

export const metadata: Metadata = { title: "Mailroom" };
export const dynamic = "force-dynamic";

/** What the app sent, caught by its local SMTP server. Exists only where mail does not leave the machine. */
export default function MailroomPage() {
  if (!mailroomEnabled()) notFound();
  return (
    <div className="mx-auto max-w-5xl px-6 py-10">
      <PageHeading
        title="Mailroom"
        lead="Every mail this server sent, as its local SMTP server received it. Nothing here left the machine; a production server with SMTP_URL has no mailroom."
      />
      <MailroomView />
    </div>
  );
}
