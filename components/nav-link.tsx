"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import type { ReactNode } from "react";

/** A header link that tells assistive technology (and the eye, by an underline) which page is open. */
export function NavLink({ href, children }: { href: string; children: ReactNode }) {
  const pathname = usePathname();
  const current = pathname === href || pathname.startsWith(`${href}/`);
  return (
    <Link
      href={href}
      aria-current={current ? "page" : undefined}
      className="text-ink-soft no-underline hover:text-ink hover:underline aria-[current=page]:text-ink aria-[current=page]:underline aria-[current=page]:decoration-2"
    >
      {children}
    </Link>
  );
}
