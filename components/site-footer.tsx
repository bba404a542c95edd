export function SiteFooter() {
  return (
    <footer className="border-t border-paper-edge">
      <div className="mx-auto flex max-w-6xl flex-wrap justify-between gap-2 px-6 py-4 text-xs text-ink-muted">
        <p>Vierbein — derivations checked step by step.</p>
        <p>
          Checks are symbolic where possible and numeric otherwise; each verdict says which.
        </p>
      </div>
    </footer>
  );
}
