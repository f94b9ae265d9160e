CREATE TABLE "analyses" (
	"id" text PRIMARY KEY NOT NULL,
	"bath_id" text NOT NULL,
	"sampled_at" timestamp with time zone NOT NULL,
	"analyst" text NOT NULL,
	"metal_mol_l" double precision,
	"free_ligand_mol_l" double precision,
	"total_ligand_mol_l" double precision,
	"ph" double precision,
	"carbonate_mol_l" double precision,
	"bromide_mol_l" double precision,
	"entered" jsonb NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"source" text NOT NULL,
	"entered_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "analyses_source_known" CHECK ("analyses"."source" in ('manual', 'csv'))
);
--> statement-breakpoint
CREATE TABLE "attachments" (
	"id" text PRIMARY KEY NOT NULL,
	"bath_id" text NOT NULL,
	"title" text NOT NULL,
	"file_name" text NOT NULL,
	"content_type" text NOT NULL,
	"size_bytes" integer NOT NULL,
	"sha256" text NOT NULL,
	"storage_key" text NOT NULL,
	"uploaded_by" text NOT NULL,
	"uploaded_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "baths" (
	"id" text PRIMARY KEY NOT NULL,
	"name" text NOT NULL,
	"process" text NOT NULL,
	"status" text DEFAULT 'active' NOT NULL,
	"volume" double precision NOT NULL,
	"volume_unit" text NOT NULL,
	"volume_l" double precision NOT NULL,
	"temperature_c" double precision,
	"make_up" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"metal" text NOT NULL,
	"ligand" text NOT NULL,
	"metal_unit" text NOT NULL,
	"ligand_unit" text NOT NULL,
	"ligand_as" text NOT NULL,
	"carbonate_as" text,
	"targets" jsonb NOT NULL,
	"site" text DEFAULT '' NOT NULL,
	"owner_id" text NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"archived_at" timestamp with time zone,
	"archived_by" text,
	CONSTRAINT "baths_status_known" CHECK ("baths"."status" in ('active', 'archived')),
	CONSTRAINT "baths_volume_positive" CHECK ("baths"."volume" > 0 and "baths"."volume_l" > 0)
);
--> statement-breakpoint
ALTER TABLE "analyses" ADD CONSTRAINT "analyses_bath_id_baths_id_fk" FOREIGN KEY ("bath_id") REFERENCES "public"."baths"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "analyses" ADD CONSTRAINT "analyses_entered_by_users_id_fk" FOREIGN KEY ("entered_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_bath_id_baths_id_fk" FOREIGN KEY ("bath_id") REFERENCES "public"."baths"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_uploaded_by_users_id_fk" FOREIGN KEY ("uploaded_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "baths" ADD CONSTRAINT "baths_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "baths" ADD CONSTRAINT "baths_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "baths" ADD CONSTRAINT "baths_archived_by_users_id_fk" FOREIGN KEY ("archived_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "analyses_bath_sampled_idx" ON "analyses" USING btree ("bath_id","sampled_at");--> statement-breakpoint
CREATE INDEX "attachments_bath_idx" ON "attachments" USING btree ("bath_id");--> statement-breakpoint
CREATE INDEX "baths_status_idx" ON "baths" USING btree ("status");