CREATE TABLE "hazard_thresholds" (
	"version" integer PRIMARY KEY NOT NULL,
	"values" jsonb NOT NULL,
	"note" text NOT NULL,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "run_releases" (
	"run_id" text PRIMARY KEY NOT NULL,
	"released_by" text NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"released_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "safety_review_events" (
	"id" serial PRIMARY KEY NOT NULL,
	"review_id" text NOT NULL,
	"action" text NOT NULL,
	"actor_id" text NOT NULL,
	"note" text,
	"at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "safety_review_events_action_known" CHECK ("safety_review_events"."action" in ('submitted', 'signed_off', 'sent_back', 'resubmitted'))
);
--> statement-breakpoint
CREATE TABLE "safety_reviews" (
	"id" text PRIMARY KEY NOT NULL,
	"subject_kind" text NOT NULL,
	"run_id" text,
	"bath_id" text,
	"hazards" jsonb NOT NULL,
	"flags" text[] NOT NULL,
	"thresholds_version" integer NOT NULL,
	"status" text DEFAULT 'pending' NOT NULL,
	"submitted_by" text NOT NULL,
	"submitted_at" timestamp with time zone DEFAULT now() NOT NULL,
	"decided_by" text,
	"decided_at" timestamp with time zone,
	"conditions" text,
	"note" text,
	CONSTRAINT "safety_reviews_status_known" CHECK ("safety_reviews"."status" in ('pending', 'signed_off', 'sent_back')),
	CONSTRAINT "safety_reviews_one_subject" CHECK (("safety_reviews"."subject_kind" = 'run' and "safety_reviews"."run_id" is not null and "safety_reviews"."bath_id" is null) or ("safety_reviews"."subject_kind" = 'bath' and "safety_reviews"."bath_id" is not null and "safety_reviews"."run_id" is null))
);
--> statement-breakpoint
ALTER TABLE "runs" ADD COLUMN "hazards" jsonb;--> statement-breakpoint
ALTER TABLE "runs" ADD COLUMN "thresholds_version" integer;--> statement-breakpoint
ALTER TABLE "hazard_thresholds" ADD CONSTRAINT "hazard_thresholds_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "run_releases" ADD CONSTRAINT "run_releases_run_id_runs_id_fk" FOREIGN KEY ("run_id") REFERENCES "public"."runs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "run_releases" ADD CONSTRAINT "run_releases_released_by_users_id_fk" FOREIGN KEY ("released_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "safety_review_events" ADD CONSTRAINT "safety_review_events_review_id_safety_reviews_id_fk" FOREIGN KEY ("review_id") REFERENCES "public"."safety_reviews"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "safety_review_events" ADD CONSTRAINT "safety_review_events_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "safety_reviews" ADD CONSTRAINT "safety_reviews_run_id_runs_id_fk" FOREIGN KEY ("run_id") REFERENCES "public"."runs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "safety_reviews" ADD CONSTRAINT "safety_reviews_bath_id_baths_id_fk" FOREIGN KEY ("bath_id") REFERENCES "public"."baths"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "safety_reviews" ADD CONSTRAINT "safety_reviews_thresholds_version_hazard_thresholds_version_fk" FOREIGN KEY ("thresholds_version") REFERENCES "public"."hazard_thresholds"("version") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "safety_reviews" ADD CONSTRAINT "safety_reviews_submitted_by_users_id_fk" FOREIGN KEY ("submitted_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "safety_reviews" ADD CONSTRAINT "safety_reviews_decided_by_users_id_fk" FOREIGN KEY ("decided_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "safety_review_events_review_idx" ON "safety_review_events" USING btree ("review_id");--> statement-breakpoint
CREATE INDEX "safety_reviews_status_idx" ON "safety_reviews" USING btree ("status");--> statement-breakpoint
CREATE INDEX "safety_reviews_run_idx" ON "safety_reviews" USING btree ("run_id");--> statement-breakpoint
CREATE INDEX "safety_reviews_bath_idx" ON "safety_reviews" USING btree ("bath_id");--> statement-breakpoint
CREATE UNIQUE INDEX "safety_reviews_one_per_run" ON "safety_reviews" USING btree ("run_id") WHERE "safety_reviews"."run_id" is not null;--> statement-breakpoint
CREATE UNIQUE INDEX "safety_reviews_one_open_per_bath" ON "safety_reviews" USING btree ("bath_id") WHERE "safety_reviews"."bath_id" is not null and "safety_reviews"."status" = 'pending';