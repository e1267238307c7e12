CREATE TABLE "attachments" (
	"id" uuid PRIMARY KEY NOT NULL,
	"page_id" uuid NOT NULL,
	"uploader_id" uuid NOT NULL,
	"original_name" text NOT NULL,
	"display_name" text NOT NULL,
	"size" bigint NOT NULL,
	"media_type" text NOT NULL,
	"sha256" text NOT NULL,
	"storage_key" text NOT NULL,
	"spectrum" jsonb,
	"parse_error" text,
	"addendum" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "attachments_storage_key_unique" UNIQUE("storage_key")
);
--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_page_id_pages_id_fk" FOREIGN KEY ("page_id") REFERENCES "public"."pages"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_uploader_id_users_id_fk" FOREIGN KEY ("uploader_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "attachments_page_created" ON "attachments" USING btree ("page_id","created_at");