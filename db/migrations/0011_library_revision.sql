CREATE TABLE "library_revision" (
	"id" integer PRIMARY KEY NOT NULL,
	"revision" bigint NOT NULL,
	CONSTRAINT "library_revision_one_row" CHECK ("library_revision"."id" = 1)
);
