CREATE TYPE "public"."user_role" AS ENUM('contributor', 'moderator', 'admin');--> statement-breakpoint
CREATE TYPE "public"."catalogue_status" AS ENUM('active', 'proposed', 'merged');--> statement-breakpoint
CREATE TYPE "public"."load_mode" AS ENUM('constant-current', 'constant-power', 'constant-resistance');--> statement-breakpoint
CREATE TYPE "public"."resistance_method" AS ENUM('iec-61960-two-level', 'dc-step', 'ac-1khz', 'charger-readout');--> statement-breakpoint
CREATE TYPE "public"."review_status" AS ENUM('pending', 'changes_requested', 'approved', 'rejected', 'withdrawn', 'disputed');--> statement-breakpoint
CREATE TYPE "public"."chart_kind" AS ENUM('label-check', 'curves', 'maker-ranking');--> statement-breakpoint
CREATE TYPE "public"."flag_reason" AS ENUM('wrong-figures', 'wrong-pack', 'duplicate', 'not-a-measurement', 'unsafe', 'other');--> statement-breakpoint
CREATE TYPE "public"."flag_status" AS ENUM('open', 'kept', 'corrected', 'withdrawn');--> statement-breakpoint
CREATE TABLE "accounts" (
	"user_id" text NOT NULL,
	"type" text NOT NULL,
	"provider" text NOT NULL,
	"provider_account_id" text NOT NULL,
	"refresh_token" text,
	"access_token" text,
	"expires_at" integer,
	"token_type" text,
	"scope" text,
	"id_token" text,
	"session_state" text,
	CONSTRAINT "accounts_provider_provider_account_id_pk" PRIMARY KEY("provider","provider_account_id")
);
--> statement-breakpoint
CREATE TABLE "sessions" (
	"session_token" text PRIMARY KEY NOT NULL,
	"user_id" text NOT NULL,
	"expires" timestamp with time zone NOT NULL
);
--> statement-breakpoint
CREATE TABLE "users" (
	"id" text PRIMARY KEY NOT NULL,
	"name" text,
	"email" text,
	"email_verified" timestamp with time zone,
	"image" text,
	"role" "user_role" DEFAULT 'contributor' NOT NULL,
	"display_name" text,
	"anonymous" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "users_email_unique" UNIQUE("email")
);
--> statement-breakpoint
CREATE TABLE "verification_tokens" (
	"identifier" text NOT NULL,
	"token" text NOT NULL,
	"expires" timestamp with time zone NOT NULL,
	CONSTRAINT "verification_tokens_identifier_token_pk" PRIMARY KEY("identifier","token")
);
--> statement-breakpoint
CREATE TABLE "makers" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "makers_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"slug" text NOT NULL,
	"name" text NOT NULL,
	"status" "catalogue_status" DEFAULT 'active' NOT NULL,
	"merged_into_id" integer,
	"proposed_by_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "makers_slug_unique" UNIQUE("slug")
);
--> statement-breakpoint
CREATE TABLE "packs" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "packs_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"slug" text NOT NULL,
	"maker_id" integer NOT NULL,
	"model" text NOT NULL,
	"cells_in_series" smallint NOT NULL,
	"rated_capacity_mah" integer NOT NULL,
	"labelled_continuous_c" real NOT NULL,
	"labelled_burst_c" real,
	"weight_g" real,
	"connector" text NOT NULL,
	"status" "catalogue_status" DEFAULT 'active' NOT NULL,
	"merged_into_id" integer,
	"proposed_by_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "packs_slug_unique" UNIQUE("slug"),
	CONSTRAINT "packs_cells_range" CHECK ("packs"."cells_in_series" between 1 and 14),
	CONSTRAINT "packs_rated_positive" CHECK ("packs"."rated_capacity_mah" > 0),
	CONSTRAINT "packs_labelled_c_positive" CHECK ("packs"."labelled_continuous_c" > 0),
	CONSTRAINT "packs_burst_ge_continuous" CHECK ("packs"."labelled_burst_c" is null or "packs"."labelled_burst_c" >= "packs"."labelled_continuous_c"),
	CONSTRAINT "packs_weight_positive" CHECK ("packs"."weight_g" is null or "packs"."weight_g" > 0)
);
--> statement-breakpoint
CREATE TABLE "bench_profiles" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "bench_profiles_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"user_id" text NOT NULL,
	"name" text NOT NULL,
	"load_equipment" text NOT NULL,
	"logger" text,
	"resistance_meter" text,
	"resistance_method" "resistance_method" NOT NULL,
	"calibrated_on" date,
	"notes" text,
	"default_ambient_c" real,
	"default_load_mode" "load_mode",
	"default_cutoff_v_per_cell" real,
	"default_stop_temperature_c" real,
	"default_sample_rate_hz" real,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "results" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "results_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"pack_id" integer NOT NULL,
	"contributor_id" text NOT NULL,
	"bench_profile_id" integer,
	"status" "review_status" DEFAULT 'pending' NOT NULL,
	"ambient_temperature_c" real NOT NULL,
	"pack_start_temperature_c" real,
	"load_mode" "load_mode" NOT NULL,
	"load_current_a" real NOT NULL,
	"cutoff_v_per_cell" real NOT NULL,
	"stop_temperature_c" real NOT NULL,
	"resistance_method" "resistance_method" NOT NULL,
	"equipment" text NOT NULL,
	"sample_rate_hz" real,
	"cycles_before_test" integer DEFAULT 0 NOT NULL,
	"tested_on" date,
	"notes" text,
	"log_key" text NOT NULL,
	"log_sha256" text NOT NULL,
	"log_bytes" integer NOT NULL,
	"log_filename" text NOT NULL,
	"photo_keys" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"figures" jsonb NOT NULL,
	"curve" jsonb NOT NULL,
	"capacity_mah" real,
	"energy_wh" real,
	"dc_resistance_mohm" real,
	"resistance_at_25c_mohm" real,
	"hold_voltage_per_cell_v" real,
	"temperature_rise_c" real,
	"sag_limited_c" real,
	"label_ratio" real,
	"capacity_ratio" real,
	"load_rate_c" real NOT NULL,
	"group_key" text NOT NULL,
	"flags" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"idempotency_key" text,
	"submitted_at" timestamp with time zone DEFAULT now() NOT NULL,
	"published_at" timestamp with time zone,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "results_ambient_range" CHECK ("results"."ambient_temperature_c" between -20 and 60),
	CONSTRAINT "results_cutoff_range" CHECK ("results"."cutoff_v_per_cell" between 2.5 and 4.2),
	CONSTRAINT "results_stop_temp_range" CHECK ("results"."stop_temperature_c" <= 80),
	CONSTRAINT "results_load_positive" CHECK ("results"."load_current_a" > 0),
	CONSTRAINT "results_cycles_nonneg" CHECK ("results"."cycles_before_test" >= 0)
);
--> statement-breakpoint
CREATE TABLE "review_events" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "review_events_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"result_id" integer NOT NULL,
	"actor_id" text,
	"from_status" "review_status",
	"to_status" "review_status" NOT NULL,
	"reason" text,
	"note" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "reader_flags" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "reader_flags_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"result_id" integer NOT NULL,
	"reporter_id" text,
	"reporter_hash" text,
	"reason" "flag_reason" NOT NULL,
	"note" text,
	"status" "flag_status" DEFAULT 'open' NOT NULL,
	"resolved_by_id" text,
	"resolution_note" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"resolved_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "saved_charts" (
	"id" text PRIMARY KEY NOT NULL,
	"kind" chart_kind NOT NULL,
	"title" text NOT NULL,
	"note" text,
	"state" jsonb NOT NULL,
	"created_by_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "watches" (
	"user_id" text NOT NULL,
	"pack_id" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "watches_user_id_pack_id_pk" PRIMARY KEY("user_id","pack_id")
);
--> statement-breakpoint
CREATE TABLE "audit_events" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "audit_events_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"actor_id" text,
	"action" text NOT NULL,
	"entity_type" text NOT NULL,
	"entity_id" text NOT NULL,
	"data" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "mail_outbox" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "mail_outbox_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"to" text NOT NULL,
	"subject" text NOT NULL,
	"text" text NOT NULL,
	"html" text,
	"attempts" integer DEFAULT 0 NOT NULL,
	"last_error" text,
	"next_attempt_at" timestamp with time zone DEFAULT now() NOT NULL,
	"sent_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "rate_limit_hits" (
	"key" text PRIMARY KEY NOT NULL,
	"count" integer NOT NULL,
	"reset_at" timestamp with time zone NOT NULL
);
--> statement-breakpoint
ALTER TABLE "accounts" ADD CONSTRAINT "accounts_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sessions" ADD CONSTRAINT "sessions_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "makers" ADD CONSTRAINT "makers_proposed_by_id_users_id_fk" FOREIGN KEY ("proposed_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "packs" ADD CONSTRAINT "packs_maker_id_makers_id_fk" FOREIGN KEY ("maker_id") REFERENCES "public"."makers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "packs" ADD CONSTRAINT "packs_proposed_by_id_users_id_fk" FOREIGN KEY ("proposed_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bench_profiles" ADD CONSTRAINT "bench_profiles_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "results" ADD CONSTRAINT "results_pack_id_packs_id_fk" FOREIGN KEY ("pack_id") REFERENCES "public"."packs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "results" ADD CONSTRAINT "results_contributor_id_users_id_fk" FOREIGN KEY ("contributor_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "results" ADD CONSTRAINT "results_bench_profile_id_bench_profiles_id_fk" FOREIGN KEY ("bench_profile_id") REFERENCES "public"."bench_profiles"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_events" ADD CONSTRAINT "review_events_result_id_results_id_fk" FOREIGN KEY ("result_id") REFERENCES "public"."results"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_events" ADD CONSTRAINT "review_events_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reader_flags" ADD CONSTRAINT "reader_flags_result_id_results_id_fk" FOREIGN KEY ("result_id") REFERENCES "public"."results"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reader_flags" ADD CONSTRAINT "reader_flags_reporter_id_users_id_fk" FOREIGN KEY ("reporter_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reader_flags" ADD CONSTRAINT "reader_flags_resolved_by_id_users_id_fk" FOREIGN KEY ("resolved_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "saved_charts" ADD CONSTRAINT "saved_charts_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "watches" ADD CONSTRAINT "watches_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "watches" ADD CONSTRAINT "watches_pack_id_packs_id_fk" FOREIGN KEY ("pack_id") REFERENCES "public"."packs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "audit_events" ADD CONSTRAINT "audit_events_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "sessions_user_idx" ON "sessions" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "users_role_idx" ON "users" USING btree ("role");--> statement-breakpoint
CREATE UNIQUE INDEX "makers_name_lower_idx" ON "makers" USING btree (lower("name"));--> statement-breakpoint
CREATE INDEX "makers_status_idx" ON "makers" USING btree ("status");--> statement-breakpoint
CREATE INDEX "packs_maker_idx" ON "packs" USING btree ("maker_id");--> statement-breakpoint
CREATE INDEX "packs_status_idx" ON "packs" USING btree ("status");--> statement-breakpoint
CREATE INDEX "bench_profiles_user_idx" ON "bench_profiles" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "results_status_idx" ON "results" USING btree ("status","submitted_at");--> statement-breakpoint
CREATE INDEX "results_pack_idx" ON "results" USING btree ("pack_id","status");--> statement-breakpoint
CREATE INDEX "results_group_idx" ON "results" USING btree ("group_key","status");--> statement-breakpoint
CREATE INDEX "results_contributor_idx" ON "results" USING btree ("contributor_id");--> statement-breakpoint
CREATE INDEX "results_log_sha_idx" ON "results" USING btree ("log_sha256");--> statement-breakpoint
CREATE UNIQUE INDEX "results_idempotency_idx" ON "results" USING btree ("contributor_id","idempotency_key");--> statement-breakpoint
CREATE INDEX "review_events_result_idx" ON "review_events" USING btree ("result_id","created_at");--> statement-breakpoint
CREATE INDEX "reader_flags_result_idx" ON "reader_flags" USING btree ("result_id");--> statement-breakpoint
CREATE INDEX "reader_flags_status_idx" ON "reader_flags" USING btree ("status");--> statement-breakpoint
CREATE INDEX "saved_charts_created_idx" ON "saved_charts" USING btree ("created_at");--> statement-breakpoint
CREATE INDEX "watches_pack_idx" ON "watches" USING btree ("pack_id");--> statement-breakpoint
CREATE INDEX "audit_events_entity_idx" ON "audit_events" USING btree ("entity_type","entity_id");--> statement-breakpoint
CREATE INDEX "mail_outbox_due_idx" ON "mail_outbox" USING btree ("sent_at","next_attempt_at");