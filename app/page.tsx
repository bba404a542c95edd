import Link from "next/link";
import { getCurrentUser } from "@/app/_server/auth";
import { SampleDerivation } from "@/components/landing/sample-derivation";
import { buttonClasses } from "@/components/ui/button";
import { roleDescriptions, roleLabels, roles } from "@/components/data/roles";

const capabilities = [
  {
    title: "Every step checked as you write",
    body: "Each relation is tested against the step before it: does it follow, do the dimensions agree, does it reduce to Newton as c → ∞. The verdict says whether it rests on a symbolic proof or on numeric probing at sample points.",
  },
  {
    title: "A spacetime toolkit in the page",
    body: "Declare coordinates and a line element once; get Christoffel symbols, curvature, geodesic equations, conserved energy and angular momentum, effective potentials, circular orbits, the ISCO and the photon sphere.",
  },
  {
    title: "Co-authors at the same time",
    body: "Authors in a group edit one notebook together and see each other's changes as they happen; checkpoints keep earlier versions.",
  },
  {
    title: "Refereed, then published",
    body: "Reviewers leave remarks on a step or a phrase. The group lead publishes frozen editions with a permanent link, a citation entry and a check ledger of each step's verdict.",
  },
];

export default async function LandingPage() {
  const user = await getCurrentUser();
  return (
    <div className="mx-auto max-w-6xl px-6 py-12">
      <section aria-labelledby="landing-title" className="grid items-start gap-10 lg:grid-cols-[1fr_1.1fr]">
        <div>
          <h1 id="landing-title" className="font-serif text-4xl font-semibold leading-tight tracking-tight sm:text-5xl">
            Derivations in general relativity, checked line by line.
          </h1>
          <p className="prose-paper mt-5 text-ink-soft">
            Vierbein is a shared notebook for relativity research groups. Write a derivation as you would in a paper — from the
            metric to the geodesic Lagrangian, its conserved quantities, the effective potential and the orbits it allows — and a
            symbolic checker reads along, marking each step verified, refuted with a counterexample, or undecided.
          </p>
          <div className="mt-7 flex flex-wrap gap-3">
            {user ? (
              <Link href="/dashboard" className={buttonClasses("primary")}>
                Go to your dashboard
              </Link>
            ) : (
              <>
                <Link href="/sign-up" className={buttonClasses("primary")}>
                  Create an account
                </Link>
                <Link href="/sign-in" className={buttonClasses("quiet")}>
                  Sign in
                </Link>
              </>
            )}
          </div>
        </div>
        <SampleDerivation />
      </section>

      <section aria-labelledby="capabilities-title" className="mt-16">
        <h2 id="capabilities-title" className="font-serif text-2xl font-semibold">
          What a group does with it
        </h2>
        <ul className="mt-6 grid gap-6 sm:grid-cols-2">
          {capabilities.map((item) => (
            <li key={item.title} className="border-l-2 border-accent pl-4">
              <h3 className="font-semibold">{item.title}</h3>
              <p className="mt-1 text-ink-soft">{item.body}</p>
            </li>
          ))}
        </ul>
      </section>

      <section aria-labelledby="roles-title" className="mt-16">
        <h2 id="roles-title" className="font-serif text-2xl font-semibold">
          Four roles in a group
        </h2>
        <dl className="mt-4 grid gap-x-8 gap-y-3 sm:grid-cols-2">
          {roles.map((role) => (
            <div key={role} className="flex gap-2">
              <dt className="font-semibold first-letter:uppercase">{roleLabels[role]}</dt>
              <dd className="text-ink-soft">— {roleDescriptions[role]}</dd>
            </div>
          ))}
        </dl>
      </section>
    </div>
  );
}
