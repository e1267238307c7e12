CREATE TYPE "public"."countersign_state" AS ENUM('waiting', 'countersigned', 'returned');--> statement-breakpoint
CREATE TYPE "public"."signature_role" AS ENUM('author', 'witness');--> statement-breakpoint
CREATE TABLE "addenda" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"page_id" uuid NOT NULL,
	"number" integer NOT NULL,
	"author_id" uuid NOT NULL,
	"author_name" text NOT NULL,
	"text" text NOT NULL,
	"attachment_ids" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"created_at" timestamp with time zone NOT NULL,
	CONSTRAINT "addenda_page_number" UNIQUE("page_id","number")
);
--> statement-breakpoint
CREATE TABLE "countersign_requests" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"page_id" uuid NOT NULL,
	"addendum_id" uuid,
	"author_signature_id" uuid NOT NULL,
	"supervisor_id" uuid NOT NULL,
	"requested_at" timestamp with time zone NOT NULL,
	"state" "countersign_state" DEFAULT 'waiting' NOT NULL,
	"resolved_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "page_returns" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid NOT NULL,
	"page_id" uuid NOT NULL,
	"addendum_id" uuid,
	"returned_by" uuid NOT NULL,
	"returned_by_name" text NOT NULL,
	"comment" text NOT NULL,
	"returned_at" timestamp with time zone NOT NULL
);
--> statement-breakpoint
CREATE TABLE "signatures" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"page_id" uuid NOT NULL,
	"addendum_id" uuid,
	"role" "signature_role" NOT NULL,
	"signer_id" uuid NOT NULL,
	"signer_name" text NOT NULL,
	"signed_at" timestamp with time zone NOT NULL,
	"meaning_code" text NOT NULL,
	"meaning" text NOT NULL,
	"content_hash" text NOT NULL,
	"signed_content" text NOT NULL
);
--> statement-breakpoint
ALTER TABLE "addenda" ADD CONSTRAINT "addenda_page_id_pages_id_fk" FOREIGN KEY ("page_id") REFERENCES "public"."pages"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "addenda" ADD CONSTRAINT "addenda_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "countersign_requests" ADD CONSTRAINT "countersign_requests_page_id_pages_id_fk" FOREIGN KEY ("page_id") REFERENCES "public"."pages"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "countersign_requests" ADD CONSTRAINT "countersign_requests_addendum_id_addenda_id_fk" FOREIGN KEY ("addendum_id") REFERENCES "public"."addenda"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "countersign_requests" ADD CONSTRAINT "countersign_requests_author_signature_id_signatures_id_fk" FOREIGN KEY ("author_signature_id") REFERENCES "public"."signatures"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "countersign_requests" ADD CONSTRAINT "countersign_requests_supervisor_id_users_id_fk" FOREIGN KEY ("supervisor_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "page_returns" ADD CONSTRAINT "page_returns_request_id_countersign_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."countersign_requests"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "page_returns" ADD CONSTRAINT "page_returns_page_id_pages_id_fk" FOREIGN KEY ("page_id") REFERENCES "public"."pages"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "page_returns" ADD CONSTRAINT "page_returns_addendum_id_addenda_id_fk" FOREIGN KEY ("addendum_id") REFERENCES "public"."addenda"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "page_returns" ADD CONSTRAINT "page_returns_returned_by_users_id_fk" FOREIGN KEY ("returned_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "signatures" ADD CONSTRAINT "signatures_page_id_pages_id_fk" FOREIGN KEY ("page_id") REFERENCES "public"."pages"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "signatures" ADD CONSTRAINT "signatures_addendum_id_addenda_id_fk" FOREIGN KEY ("addendum_id") REFERENCES "public"."addenda"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "signatures" ADD CONSTRAINT "signatures_signer_id_users_id_fk" FOREIGN KEY ("signer_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "countersign_requests_queue" ON "countersign_requests" USING btree ("supervisor_id","state","requested_at");--> statement-breakpoint
CREATE INDEX "signatures_page" ON "signatures" USING btree ("page_id");