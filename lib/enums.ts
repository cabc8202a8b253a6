// The domain's value lists (roles, review statuses, load modes, resistance methods, flag reasons and
// resolutions). Pure, so client components (forms, labels) use them without pulling the ORM into the
// browser bundle; db/schema builds its pgEnums from these.
export const userRoles = ["contributor", "moderator", "admin"] as const;
export type UserRole = (typeof userRoles)[number];

// A reader's flag never changes a result's status: it opens a case (an open row in reader_flags) that
// moderators resolve, and the result stays approved and counted until they decide.
export const reviewStatuses = ["pending", "awaiting_answer", "approved", "rejected", "withdrawn"] as const;
export type ReviewStatus = (typeof reviewStatuses)[number];

/** Why a moderator did not accept a result (stored as the review event's reason). */
export const rejectReasons = ["wrong-data", "incomplete-method", "duplicate", "not-a-measurement", "other"] as const;
export type RejectReason = (typeof rejectReasons)[number];

export const loadModes = ["constant-current", "constant-power", "constant-resistance"] as const;
export type LoadMode = (typeof loadModes)[number];

/** What the tester states they used to measure resistance (the computed method is in the figures). */
export const resistanceMethods = ["iec-61960-two-level", "dc-step", "ac-1khz", "charger-readout"] as const;
export type ResistanceMethod = (typeof resistanceMethods)[number];

/** Why a reader flags a published result, and how a moderator resolves it. */
export const flagReasons = [
  "wrong-figures",
  "wrong-pack",
  "duplicate",
  "not-a-measurement",
  "unsafe",
  "other",
] as const;
export type FlagReason = (typeof flagReasons)[number];
export const flagStatuses = ["open", "kept", "corrected", "withdrawn"] as const;
