// Users and the tables Auth.js (Drizzle adapter) expects. The role lives on the user row and is read
// fresh on every request (database sessions), so a demotion takes effect at once.
import { boolean, integer, pgEnum, pgTable, primaryKey, text, timestamp, index } from "drizzle-orm/pg-core";
import { userRoles, type UserRole } from "@/lib/enums";

export { userRoles, type UserRole };
export const userRole = pgEnum("user_role", userRoles);

export const users = pgTable(
  "users",
  {
    id: text("id")
      .primaryKey()
      .$defaultFn(() => crypto.randomUUID()),
    name: text("name"),
    email: text("email").unique(),
    emailVerified: timestamp("email_verified", { mode: "date", withTimezone: true }),
    image: text("image"),
    role: userRole("role").notNull().default("contributor"),
    // Shown on published results unless the contributor chose to stay anonymous. The choice is explicit:
    // until public_name_chosen_at is set, published results say "a contributor" (lib/user-name.ts) and
    // /submit asks for the choice first.
    displayName: text("display_name"),
    anonymous: boolean("anonymous").notNull().default(false),
    publicNameChosenAt: timestamp("public_name_chosen_at", { withTimezone: true }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("users_role_idx").on(t.role)],
);

export const accounts = pgTable(
  "accounts",
  {
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    type: text("type").notNull(),
    provider: text("provider").notNull(),
    providerAccountId: text("provider_account_id").notNull(),
    refresh_token: text("refresh_token"),
    access_token: text("access_token"),
    expires_at: integer("expires_at"),
    token_type: text("token_type"),
    scope: text("scope"),
    id_token: text("id_token"),
    session_state: text("session_state"),
  },
  (t) => [primaryKey({ columns: [t.provider, t.providerAccountId] }), index("accounts_user_idx").on(t.userId)],
);

export const sessions = pgTable(
  "sessions",
  {
    sessionToken: text("session_token").primaryKey(),
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    expires: timestamp("expires", { mode: "date", withTimezone: true }).notNull(),
  },
  (t) => [index("sessions_user_idx").on(t.userId)],
);

export const verificationTokens = pgTable(
  "verification_tokens",
  {
    identifier: text("identifier").notNull(),
    token: text("token").notNull(),
    expires: timestamp("expires", { mode: "date", withTimezone: true }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.identifier, t.token] })],
);
