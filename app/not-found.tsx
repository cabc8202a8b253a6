"use client";
// The page for an address with nothing at it (status 404). A client component on purpose: every page carries its
// layouts' not-found, forbidden and unauthorized views in its React payload, and a client component travels as
// a reference of a few bytes instead of its whole markup (Next's default 404 alone is ≈ 1 KB per layout).
export default function NotFound() {
  return (
    <div className="mx-auto max-w-lg space-y-3 px-4 py-8" data-testid="not-found">
      <p className="num muted text-sm">404 · not found</p>
      <h1>Nothing is published at this address</h1>
      <p className="muted">
        The link may be mistyped, or what it pointed to was merged into another pack or withdrawn by its tester.
      </p>
      <p>
        <a href="/packs">Search the packs</a> · <a href="/">Home</a>
      </p>
    </div>
  );
}
