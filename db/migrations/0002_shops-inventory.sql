CREATE TABLE "shop_inventory" (
	"id" text PRIMARY KEY DEFAULT gen_random_uuid()::text NOT NULL,
	"organization_id" text NOT NULL,
	"part_id" text NOT NULL,
	"sku" text NOT NULL,
	"price_cents" integer NOT NULL,
	"currency" text NOT NULL,
	"on_hand" integer DEFAULT 0 NOT NULL,
	"reserved" integer DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "shop_inventory_on_hand_nonneg" CHECK ("shop_inventory"."on_hand" >= 0),
	CONSTRAINT "shop_inventory_reserved_range" CHECK ("shop_inventory"."reserved" >= 0 AND "shop_inventory"."reserved" <= "shop_inventory"."on_hand"),
	CONSTRAINT "shop_inventory_price_nonneg" CHECK ("shop_inventory"."price_cents" >= 0)
);
--> statement-breakpoint
CREATE TABLE "shop_profiles" (
	"organization_id" text PRIMARY KEY NOT NULL,
	"location" text,
	"about" text,
	"currency" text DEFAULT 'USD' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "shop_inventory" ADD CONSTRAINT "shop_inventory_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shop_inventory" ADD CONSTRAINT "shop_inventory_part_id_parts_id_fk" FOREIGN KEY ("part_id") REFERENCES "public"."parts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shop_profiles" ADD CONSTRAINT "shop_profiles_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "shop_inventory_org_part_uq" ON "shop_inventory" USING btree ("organization_id","part_id");--> statement-breakpoint
CREATE UNIQUE INDEX "shop_inventory_org_sku_uq" ON "shop_inventory" USING btree ("organization_id","sku");--> statement-breakpoint
CREATE INDEX "shop_inventory_part_idx" ON "shop_inventory" USING btree ("part_id");