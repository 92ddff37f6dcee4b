CREATE TABLE "shop_api_keys" (
	"id" text PRIMARY KEY DEFAULT gen_random_uuid()::text NOT NULL,
	"organization_id" text NOT NULL,
	"name" text NOT NULL,
	"start" text NOT NULL,
	"key_hash" text NOT NULL,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"last_used_at" timestamp with time zone,
	"revoked_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "shop_solve_log" (
	"id" text PRIMARY KEY DEFAULT gen_random_uuid()::text NOT NULL,
	"organization_id" text NOT NULL,
	"outcome" text NOT NULL,
	"missing_part_ids" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "payment_events" (
	"event_id" text PRIMARY KEY NOT NULL,
	"type" text NOT NULL,
	"quote_id" text,
	"outcome" text NOT NULL,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "quote_lines" (
	"id" text PRIMARY KEY DEFAULT gen_random_uuid()::text NOT NULL,
	"quote_id" text NOT NULL,
	"inventory_id" text,
	"part_id" text NOT NULL,
	"position" integer NOT NULL,
	"sku" text NOT NULL,
	"name" text NOT NULL,
	"requested_quantity" integer NOT NULL,
	"quantity" integer NOT NULL,
	"unit_price_cents" integer NOT NULL,
	CONSTRAINT "quote_lines_quantity_nonneg" CHECK ("quote_lines"."quantity" >= 0),
	CONSTRAINT "quote_lines_price_nonneg" CHECK ("quote_lines"."unit_price_cents" >= 0)
);
--> statement-breakpoint
CREATE TABLE "quotes" (
	"id" text PRIMARY KEY DEFAULT gen_random_uuid()::text NOT NULL,
	"ref" text NOT NULL,
	"buyer_id" text NOT NULL,
	"organization_id" text NOT NULL,
	"build_id" text,
	"build_slug" text NOT NULL,
	"build_title" text NOT NULL,
	"train" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"missing" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"status" text DEFAULT 'requested' NOT NULL,
	"buyer_note" text,
	"shop_note" text,
	"currency" text NOT NULL,
	"shipping_cents" integer DEFAULT 0 NOT NULL,
	"total_cents" integer DEFAULT 0 NOT NULL,
	"valid_days" integer,
	"quoted_at" timestamp with time zone,
	"expires_at" timestamp with time zone,
	"checkout_session_id" text,
	"checkout_url" text,
	"payment_intent_id" text,
	"paid_at" timestamp with time zone,
	"shipped_at" timestamp with time zone,
	"tracking" text,
	"refund_id" text,
	"refunded_at" timestamp with time zone,
	"cancelled_at" timestamp with time zone,
	"cancel_reason" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "quotes_ref_unique" UNIQUE("ref"),
	CONSTRAINT "quotes_shipping_nonneg" CHECK ("quotes"."shipping_cents" >= 0),
	CONSTRAINT "quotes_status_known" CHECK ("quotes"."status" in ('requested','quoted','awaiting_payment','paid','shipped','cancelled','refunded'))
);
--> statement-breakpoint
ALTER TABLE "shop_api_keys" ADD CONSTRAINT "shop_api_keys_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shop_api_keys" ADD CONSTRAINT "shop_api_keys_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shop_solve_log" ADD CONSTRAINT "shop_solve_log_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payment_events" ADD CONSTRAINT "payment_events_quote_id_quotes_id_fk" FOREIGN KEY ("quote_id") REFERENCES "public"."quotes"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quote_lines" ADD CONSTRAINT "quote_lines_quote_id_quotes_id_fk" FOREIGN KEY ("quote_id") REFERENCES "public"."quotes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quote_lines" ADD CONSTRAINT "quote_lines_inventory_id_shop_inventory_id_fk" FOREIGN KEY ("inventory_id") REFERENCES "public"."shop_inventory"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quote_lines" ADD CONSTRAINT "quote_lines_part_id_parts_id_fk" FOREIGN KEY ("part_id") REFERENCES "public"."parts"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotes" ADD CONSTRAINT "quotes_buyer_id_user_id_fk" FOREIGN KEY ("buyer_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotes" ADD CONSTRAINT "quotes_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotes" ADD CONSTRAINT "quotes_build_id_builds_id_fk" FOREIGN KEY ("build_id") REFERENCES "public"."builds"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "shop_api_keys_hash_uq" ON "shop_api_keys" USING btree ("key_hash");--> statement-breakpoint
CREATE INDEX "shop_api_keys_org_idx" ON "shop_api_keys" USING btree ("organization_id");--> statement-breakpoint
CREATE INDEX "shop_solve_log_org_time_idx" ON "shop_solve_log" USING btree ("organization_id","created_at");--> statement-breakpoint
CREATE INDEX "quote_lines_quote_idx" ON "quote_lines" USING btree ("quote_id","position");--> statement-breakpoint
CREATE INDEX "quotes_buyer_idx" ON "quotes" USING btree ("buyer_id","created_at");--> statement-breakpoint
CREATE INDEX "quotes_org_idx" ON "quotes" USING btree ("organization_id","created_at");--> statement-breakpoint
CREATE INDEX "quotes_session_idx" ON "quotes" USING btree ("checkout_session_id");