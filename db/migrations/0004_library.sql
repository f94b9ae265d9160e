CREATE TABLE "constant_terms" (
	"constant_id" integer NOT NULL,
	"species_id" integer NOT NULL,
	"coefficient" double precision NOT NULL,
	"position" integer NOT NULL,
	CONSTRAINT "constant_terms_constant_id_species_id_pk" PRIMARY KEY("constant_id","species_id"),
	CONSTRAINT "constant_terms_nonzero" CHECK ("constant_terms"."coefficient" <> 0)
);
--> statement-breakpoint
CREATE TABLE "constants" (
	"id" serial PRIMARY KEY NOT NULL,
	"lineage_id" text NOT NULL,
	"version" integer NOT NULL,
	"replaces_id" integer,
	"kind" text NOT NULL,
	"reaction" text NOT NULL,
	"reaction_key" text NOT NULL,
	"defines_species_id" integer NOT NULL,
	"log_value" double precision NOT NULL,
	"uncertainty" double precision,
	"temperature_c" double precision DEFAULT 25 NOT NULL,
	"ionic_strength" double precision DEFAULT 0 NOT NULL,
	"medium" text DEFAULT '' NOT NULL,
	"enthalpy_kj_mol" double precision,
	"source" text NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"status" text NOT NULL,
	"proposed_by" text,
	"proposed_at" timestamp with time zone DEFAULT now() NOT NULL,
	"reviewed_by" text,
	"reviewed_at" timestamp with time zone,
	"review_note" text,
	"retired_by" text,
	"retired_at" timestamp with time zone,
	"retire_note" text,
	CONSTRAINT "constants_kind_known" CHECK ("constants"."kind" in ('solubility_product', 'cumulative_formation', 'stepwise_formation', 'protonation')),
	CONSTRAINT "constants_status_known" CHECK ("constants"."status" in ('draft', 'approved', 'rejected', 'retired')),
	CONSTRAINT "constants_version_positive" CHECK ("constants"."version" >= 1),
	CONSTRAINT "constants_log_finite" CHECK ("constants"."log_value" between -80 and 80)
);
--> statement-breakpoint
CREATE TABLE "run_constants" (
	"run_id" text NOT NULL,
	"constant_id" integer NOT NULL,
	CONSTRAINT "run_constants_run_id_constant_id_pk" PRIMARY KEY("run_id","constant_id")
);
--> statement-breakpoint
CREATE TABLE "runs" (
	"id" text PRIMARY KEY NOT NULL,
	"title" text DEFAULT '' NOT NULL,
	"calculator" text NOT NULL,
	"inputs" jsonb NOT NULL,
	"problem" jsonb NOT NULL,
	"result" jsonb NOT NULL,
	"warnings" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"constants_used" jsonb NOT NULL,
	"engine_version" text NOT NULL,
	"status" text NOT NULL,
	"uses_drafts" boolean DEFAULT false NOT NULL,
	"author_id" text NOT NULL,
	"bath_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"deleted_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "species" (
	"id" serial PRIMARY KEY NOT NULL,
	"formula" text NOT NULL,
	"name" text NOT NULL,
	"charge" integer NOT NULL,
	"molar_mass" numeric(14, 5) NOT NULL,
	"role" text NOT NULL,
	"aliases" text[] DEFAULT '{}'::text[] NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "species_role_known" CHECK ("species"."role" = any('{metal,ligand,proton,water,counter_ion,complex,solid,salt}'::text[]))
);
--> statement-breakpoint
ALTER TABLE "constant_terms" ADD CONSTRAINT "constant_terms_constant_id_constants_id_fk" FOREIGN KEY ("constant_id") REFERENCES "public"."constants"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "constant_terms" ADD CONSTRAINT "constant_terms_species_id_species_id_fk" FOREIGN KEY ("species_id") REFERENCES "public"."species"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "constants" ADD CONSTRAINT "constants_replaces_id_constants_id_fk" FOREIGN KEY ("replaces_id") REFERENCES "public"."constants"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "constants" ADD CONSTRAINT "constants_defines_species_id_species_id_fk" FOREIGN KEY ("defines_species_id") REFERENCES "public"."species"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "constants" ADD CONSTRAINT "constants_proposed_by_users_id_fk" FOREIGN KEY ("proposed_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "constants" ADD CONSTRAINT "constants_reviewed_by_users_id_fk" FOREIGN KEY ("reviewed_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "constants" ADD CONSTRAINT "constants_retired_by_users_id_fk" FOREIGN KEY ("retired_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "run_constants" ADD CONSTRAINT "run_constants_run_id_runs_id_fk" FOREIGN KEY ("run_id") REFERENCES "public"."runs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "run_constants" ADD CONSTRAINT "run_constants_constant_id_constants_id_fk" FOREIGN KEY ("constant_id") REFERENCES "public"."constants"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "runs" ADD CONSTRAINT "runs_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "constants_lineage_version_idx" ON "constants" USING btree ("lineage_id","version");--> statement-breakpoint
CREATE UNIQUE INDEX "constants_one_approved_per_lineage" ON "constants" USING btree ("lineage_id") WHERE "constants"."status" = 'approved';--> statement-breakpoint
CREATE UNIQUE INDEX "constants_one_approved_per_species" ON "constants" USING btree ("defines_species_id") WHERE "constants"."status" = 'approved';--> statement-breakpoint
CREATE UNIQUE INDEX "constants_one_draft_per_lineage" ON "constants" USING btree ("lineage_id") WHERE "constants"."status" = 'draft' and "constants"."replaces_id" is not null;--> statement-breakpoint
CREATE INDEX "constants_status_idx" ON "constants" USING btree ("status");--> statement-breakpoint
CREATE INDEX "runs_created_idx" ON "runs" USING btree ("created_at");--> statement-breakpoint
CREATE INDEX "runs_author_idx" ON "runs" USING btree ("author_id");--> statement-breakpoint
CREATE UNIQUE INDEX "species_formula_idx" ON "species" USING btree ("formula");