"use server";
// Public on purpose: signing out without a session does nothing harmful. Auth.js deletes the database
// session named by the cookie and clears the cookie, then we go home.
import { signOut as authSignOut } from "@/server/auth";

export async function signOut(): Promise<void> {
  await authSignOut({ redirectTo: "/" });
}
