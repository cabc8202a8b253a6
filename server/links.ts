// Absolute links that leave the site (in e-mails), from the run-time APP_URL.
import "server-only";
import { env } from "@/server/env";

export function appUrl(path: string): string {
  return `${env().APP_URL.replace(/\/$/, "")}${path}`;
}

/** The contributor's own view of a result: it exists whatever the result's state (unlike /results/<id>). */
export function ownResultUrl(resultId: number): string {
  return appUrl(`/account/results/${resultId}`);
}
