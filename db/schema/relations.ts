import { relations } from "drizzle-orm";
import { users } from "./auth";
import { makers, packs } from "./catalogue";
import { benchProfiles, results, reviewEvents } from "./results";
import { packEmails, readerFlags } from "./community";

export const usersRelations = relations(users, ({ many }) => ({
  results: many(results),
  benchProfiles: many(benchProfiles),
  packEmails: many(packEmails),
}));
export const makersRelations = relations(makers, ({ many }) => ({ packs: many(packs) }));
export const packsRelations = relations(packs, ({ one, many }) => ({
  maker: one(makers, { fields: [packs.makerId], references: [makers.id] }),
  results: many(results),
}));
export const resultsRelations = relations(results, ({ one, many }) => ({
  pack: one(packs, { fields: [results.packId], references: [packs.id] }),
  contributor: one(users, { fields: [results.contributorId], references: [users.id] }),
  benchProfile: one(benchProfiles, { fields: [results.benchProfileId], references: [benchProfiles.id] }),
  events: many(reviewEvents),
  flags: many(readerFlags),
}));
export const reviewEventsRelations = relations(reviewEvents, ({ one }) => ({
  result: one(results, { fields: [reviewEvents.resultId], references: [results.id] }),
  actor: one(users, { fields: [reviewEvents.actorId], references: [users.id] }),
}));
export const benchProfilesRelations = relations(benchProfiles, ({ one }) => ({
  user: one(users, { fields: [benchProfiles.userId], references: [users.id] }),
}));
export const readerFlagsRelations = relations(readerFlags, ({ one }) => ({
  result: one(results, { fields: [readerFlags.resultId], references: [results.id] }),
}));
export const packEmailsRelations = relations(packEmails, ({ one }) => ({
  pack: one(packs, { fields: [packEmails.packId], references: [packs.id] }),
  user: one(users, { fields: [packEmails.userId], references: [users.id] }),
}));
