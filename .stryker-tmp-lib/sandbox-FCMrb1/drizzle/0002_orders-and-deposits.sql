CREATE TYPE "public"."deposit_kind" AS ENUM('percent', 'fixed');--> statement-breakpoint
CREATE TYPE "public"."order_status" AS ENUM('awaiting-payment', 'paid', 'parts-reserved', 'back-ordered', 'fitted', 'cancelled', 'refunded');--> statement-breakpoint
CREATE TABLE "order_events" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"order_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"message" text NOT NULL,
	"amount" numeric(12, 2),
	"reference" text,
	"actor_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "order_reservations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"order_id" uuid NOT NULL,
	"part_number" text NOT NULL,
	"description" text NOT NULL,
	"quantity" integer NOT NULL,
	"reserved" integer NOT NULL,
	"back_ordered" integer NOT NULL,
	"released_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "orders" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"recommendation_id" uuid NOT NULL,
	"sheet_version_id" uuid NOT NULL,
	"customer_name" text NOT NULL,
	"customer_email" text,
	"currency" text NOT NULL,
	"total" numeric(12, 2) NOT NULL,
	"deposit" numeric(12, 2) NOT NULL,
	"status" "order_status" DEFAULT 'awaiting-payment' NOT NULL,
	"checkout_session_id" text,
	"payment_intent_id" text,
	"refund_id" text,
	"paid_at" timestamp with time zone,
	"fitted_at" timestamp with time zone,
	"fitted_datalog_id" uuid,
	"cancelled_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "orders_checkout_session_id_unique" UNIQUE("checkout_session_id")
);
--> statement-breakpoint
CREATE TABLE "payment_events" (
	"event_id" text PRIMARY KEY NOT NULL,
	"type" text NOT NULL,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "sheet_versions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"recommendation_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"snapshot" jsonb NOT NULL,
	"sent_at" timestamp with time zone DEFAULT now() NOT NULL,
	"revoked_at" timestamp with time zone,
	"declined_at" timestamp with time zone,
	"decline_reason" text
);
--> statement-breakpoint
ALTER TABLE "recommendations" ADD COLUMN "title" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "recommendations" ADD COLUMN "target_rpm" double precision;--> statement-breakpoint
ALTER TABLE "shop_settings" ADD COLUMN "currency" text DEFAULT 'USD' NOT NULL;--> statement-breakpoint
ALTER TABLE "shop_settings" ADD COLUMN "deposit_kind" "deposit_kind" DEFAULT 'percent' NOT NULL;--> statement-breakpoint
ALTER TABLE "shop_settings" ADD COLUMN "deposit_value" numeric(12, 2) DEFAULT '25' NOT NULL;--> statement-breakpoint
ALTER TABLE "order_events" ADD CONSTRAINT "order_events_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "order_events" ADD CONSTRAINT "order_events_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "order_reservations" ADD CONSTRAINT "order_reservations_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_recommendation_id_recommendations_id_fk" FOREIGN KEY ("recommendation_id") REFERENCES "public"."recommendations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_sheet_version_id_sheet_versions_id_fk" FOREIGN KEY ("sheet_version_id") REFERENCES "public"."sheet_versions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_fitted_datalog_id_datalogs_id_fk" FOREIGN KEY ("fitted_datalog_id") REFERENCES "public"."datalogs"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sheet_versions" ADD CONSTRAINT "sheet_versions_recommendation_id_recommendations_id_fk" FOREIGN KEY ("recommendation_id") REFERENCES "public"."recommendations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "order_events_order_idx" ON "order_events" USING btree ("order_id","id");--> statement-breakpoint
CREATE INDEX "order_reservations_order_idx" ON "order_reservations" USING btree ("order_id");--> statement-breakpoint
CREATE INDEX "orders_status_idx" ON "orders" USING btree ("status","updated_at");--> statement-breakpoint
CREATE UNIQUE INDEX "orders_version_idx" ON "orders" USING btree ("sheet_version_id");--> statement-breakpoint
CREATE UNIQUE INDEX "sheet_versions_number_idx" ON "sheet_versions" USING btree ("recommendation_id","version");