ALTER TABLE "runs" ADD COLUMN "verdict" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "runs" ADD COLUMN "output" jsonb;--> statement-breakpoint
ALTER TABLE "runs" ADD COLUMN "deleted_by" text;--> statement-breakpoint
ALTER TABLE "runs" ADD CONSTRAINT "runs_bath_id_baths_id_fk" FOREIGN KEY ("bath_id") REFERENCES "public"."baths"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "runs" ADD CONSTRAINT "runs_deleted_by_users_id_fk" FOREIGN KEY ("deleted_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "runs_bath_idx" ON "runs" USING btree ("bath_id");