import Link from "next/link";

export default function NotFound() {
  return (
    <div className="mx-auto max-w-xl px-6 py-16">
      <h1 className="font-serif text-2xl font-semibold">Page not found</h1>
      <p className="mt-2 text-ink-soft">There is nothing at this address.</p>
      <p className="mt-4">
        <Link href="/">Go to the start page</Link>
      </p>
    </div>
  );
}
