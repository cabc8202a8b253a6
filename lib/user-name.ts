// How a user is named. Published results show the display name the contributor chose, "Anonymous tester"
// when they chose anonymity, and "A contributor" while they have made no choice (older accounts with an
// empty name: they never asked to be anonymous, and no name is invented for them). The header shows the
// signed-in person their display name, or the part of their address before the @.
export const ANONYMOUS_NAME = "Anonymous tester";
export const UNNAMED_CONTRIBUTOR = "A contributor";

export function publicName(u: { displayName: string | null; email: string | null }): string {
  return u.displayName?.trim() || u.email?.split("@")[0] || "Your account";
}

export function nameOnResults(u: { displayName: string | null; anonymous: boolean }): string {
  if (u.anonymous) return ANONYMOUS_NAME;
  return u.displayName?.trim() || UNNAMED_CONTRIBUTOR;
}
