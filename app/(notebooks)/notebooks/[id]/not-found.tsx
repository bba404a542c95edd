import Link from "next/link";

export default function NotebookNotFound() {
  return (
    <div className="mx-auto max-w-xl px-6 py-16">
      <h1 className="font-serif text-2xl font-semibold">No such notebook</h1>
      <p className="mt-2 text-ink-soft">
        This notebook does not exist, was deleted, or belongs to a group you are not in.
      </p>
      <p className="mt-4">
        <Link href="/dashboard">Back to the dashboard</Link>
      </p>
    </div>
  );
}
