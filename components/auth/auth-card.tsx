import type { ReactNode } from "react";

/** The narrow sheet that holds every sign-in, sign-up and reset form. */
export function AuthCard({ title, lead, children, footer }: { title: string; lead?: ReactNode; children: ReactNode; footer?: ReactNode }) {
  return (
    <div className="mx-auto w-full max-w-md px-6 py-12">
      <div className="rounded-lg border border-paper-edge bg-white/70 p-7 shadow-sm">
        <h1 className="font-serif text-2xl font-semibold">{title}</h1>
        {lead && <p className="mt-1 text-sm text-ink-soft">{lead}</p>}
        <div className="mt-6">{children}</div>
      </div>
      {footer && <div className="mt-4 text-center text-sm text-ink-soft">{footer}</div>}
    </div>
  );
}
