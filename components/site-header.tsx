import Link from "next/link";
import { getCurrentUser } from "@/app/_server/auth";
import { NavLink } from "@/components/nav-link";
import { SignOutButton } from "@/components/sign-out-button";
import { buttonClasses } from "@/components/ui/button";

/** The top bar: the name, and either the signed-in person's places or the way in. */
export async function SiteHeader() {
  const user = await getCurrentUser();
  return (
    <header className="border-b border-paper-edge bg-paper">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-3 px-6 py-3">
        <Link href={user ? "/dashboard" : "/"} className="flex items-baseline gap-2 text-ink no-underline hover:text-ink">
          <span aria-hidden="true" className="font-serif text-xl italic text-accent">
            e<sub className="text-xs">a</sub><sup className="text-xs">μ</sup>
          </span>
          <span className="font-serif text-xl font-semibold tracking-tight">Vierbein</span>
        </Link>
        <nav aria-label="Main">
          {user ? (
            <ul className="flex items-center gap-4 text-sm">
              <li>
                <NavLink href="/dashboard">Dashboard</NavLink>
              </li>
              <li>
                <NavLink href="/account">
                  Account
                  <span className="sr-only"> ({user.email})</span>
                </NavLink>
              </li>
              <li>
                <SignOutButton />
              </li>
            </ul>
          ) : (
            <ul className="flex items-center gap-3 text-sm">
              <li>
                <Link href="/sign-in" className="text-ink-soft no-underline hover:text-ink hover:underline">
                  Sign in
                </Link>
              </li>
              <li>
                <Link href="/sign-up" className={buttonClasses("primary", "py-1.5")}>
                  Create an account
                </Link>
              </li>
            </ul>
          )}
        </nav>
      </div>
    </header>
  );
}
