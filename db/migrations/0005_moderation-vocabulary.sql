-- Issue 14, written by hand (drizzle-kit would drop and re-create what is only renamed here).
-- 1. The review state "changes_requested" gets a name of Sagline's own: the result is back with its contributor
--    for an answer. Rows keep their state; only the label of the enum value changes.
ALTER TYPE "public"."review_status" RENAME VALUE 'changes_requested' TO 'awaiting_answer';--> statement-breakpoint
-- 2. "Watches" become what they are: requests for new-result e-mails about a pack. Same rows, plain names.
ALTER TABLE "watches" RENAME TO "pack_emails";--> statement-breakpoint
ALTER TABLE "pack_emails" RENAME CONSTRAINT "watches_user_id_users_id_fk" TO "pack_emails_user_id_users_id_fk";--> statement-breakpoint
ALTER TABLE "pack_emails" RENAME CONSTRAINT "watches_pack_id_packs_id_fk" TO "pack_emails_pack_id_packs_id_fk";--> statement-breakpoint
ALTER TABLE "pack_emails" RENAME CONSTRAINT "watches_user_id_pack_id_pk" TO "pack_emails_user_id_pack_id_pk";--> statement-breakpoint
ALTER INDEX "watches_pack_idx" RENAME TO "pack_emails_pack_idx";--> statement-breakpoint
-- 3. The public name is an explicit choice. Who already gave a display name or ticked "anonymous" chose; the
--    others (an empty name, not anonymous) are shown as "a contributor" until they choose.
ALTER TABLE "users" ADD COLUMN "public_name_chosen_at" timestamp with time zone;--> statement-breakpoint
UPDATE "users" SET "public_name_chosen_at" = "created_at" WHERE "anonymous" OR coalesce(btrim("display_name"), '') <> '';--> statement-breakpoint
-- 4. The mail worker (scripts/mail-worker.ts) LISTENs on "mail_outbox": any statement that queues mail wakes
--    it when its transaction commits (a rolled-back transaction notifies nobody).
CREATE FUNCTION "mail_outbox_notify"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM pg_notify('mail_outbox', '');
  RETURN NULL;
END
$$;--> statement-breakpoint
CREATE TRIGGER "mail_outbox_notify" AFTER INSERT ON "mail_outbox" FOR EACH STATEMENT EXECUTE FUNCTION "mail_outbox_notify"();
