import type { ReactNode } from "react";

/** A titled sheet of paper; the heading labels the section for assistive technology. */
export function Panel({ title, id, children, className = "" }: { title: string; id: string; children: ReactNode; className?: string }) {
  return (
    <section aria-labelledby={id} className={`rounded-lg border border-paper-edge bg-white/60 p-5 shadow-[0_1px_0_rgba(0,0,0,0.04)] ${className}`}>
      <h2 id={id} className="mb-4 font-serif text-xl font-semibold">
        {title}
      </h2>
      {children}
    </section>
  );
}
