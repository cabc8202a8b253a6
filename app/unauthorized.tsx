"use client";
// The 401 view Next.js carries in every page's payload (authInterrupts is on for forbidden()). Sagline's pages
// send strangers to the sign-in page instead of calling unauthorized(), so this shows only if one ever does;
// it replaces the framework's default markup with a reference (see not-found.tsx).
export default function Unauthorized() {
  return (
    <div className="mx-auto max-w-lg space-y-3 px-4 py-8" data-testid="unauthorized">
      <p className="num muted text-sm">401 · sign-in needed</p>
      <h1>Sign in to open this page</h1>
      <p>
        <a href="/sign-in">Sign in</a> · <a href="/">Home</a>
      </p>
    </div>
  );
}
