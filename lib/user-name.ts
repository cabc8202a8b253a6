// How a user is named. Published results show the display name, or "Anonymous tester"; the header shows
// the signed-in person their display name, or the part of their address before the @.
export const ANONYMOUS_NAME = "Anonymous tester";

export function publicName(u: { displayName: string | null; email: string | null }): string {
  return u.displayName?.trim() || u.email?.split("@")[0] || "Your account";
}

export function nameOnResults(u: { displayName: string | null; anonymous: boolean }): string {
  return u.anonymous || !u.displayName?.trim() ? ANONYMOUS_NAME : u.displayName.trim();
}
