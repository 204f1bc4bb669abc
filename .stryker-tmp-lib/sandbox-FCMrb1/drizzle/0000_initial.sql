CREATE TYPE "public"."blower_kind" AS ENUM('roots', 'twin-screw');--> statement-breakpoint
CREATE TYPE "public"."pulley_position" AS ENUM('crank', 'blower');--> statement-breakpoint
CREATE TYPE "public"."recommendation_status" AS ENUM('draft', 'sent', 'accepted', 'declined');--> statement-breakpoint
CREATE TYPE "public"."role" AS ENUM('member', 'tuner', 'sales', 'instructor', 'admin');--> statement-breakpoint
CREATE TYPE "public"."token_kind" AS ENUM('magic-link', 'password-reset');--> statement-breakpoint
CREATE TYPE "public"."unit_system" AS ENUM('imperial', 'metric');--> statement-breakpoint
CREATE TABLE "auth_tokens" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" uuid NOT NULL,
	"kind" "token_kind" NOT NULL,
	"token_hash" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"used_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "auth_tokens_token_hash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
CREATE TABLE "blowers" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"part_number" text NOT NULL,
	"name" text NOT NULL,
	"kind" "blower_kind" NOT NULL,
	"displacement_per_rev" double precision NOT NULL,
	"built_in_volume_ratio" double precision NOT NULL,
	"max_rpm" double precision NOT NULL,
	"volumetric_efficiency_ref" double precision NOT NULL,
	"reference_rpm" double precision NOT NULL,
	"internal_efficiency" double precision NOT NULL,
	"mechanical_efficiency" double precision NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"price" numeric(12, 2) NOT NULL,
	"stock" integer DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "blowers_part_number_unique" UNIQUE("part_number")
);
--> statement-breakpoint
CREATE TABLE "combination_revisions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"combination_id" uuid NOT NULL,
	"number" integer NOT NULL,
	"name" text NOT NULL,
	"spec" jsonb NOT NULL,
	"note" text,
	"author_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "combinations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"owner_id" uuid NOT NULL,
	"name" text NOT NULL,
	"customer_name" text,
	"customer_contact" text,
	"spec" jsonb NOT NULL,
	"displacement" double precision NOT NULL,
	"blower_kind" "blower_kind" NOT NULL,
	"blower_pulley_diameter" double precision NOT NULL,
	"revision" integer DEFAULT 1 NOT NULL,
	"is_demo" boolean DEFAULT false NOT NULL,
	"deleted_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "datalog_points" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"datalog_id" uuid NOT NULL,
	"seq" integer NOT NULL,
	"line" integer NOT NULL,
	"time" double precision,
	"rpm" double precision NOT NULL,
	"manifold_pressure" double precision NOT NULL,
	"intake_temperature" double precision,
	"throttle" double precision
);
--> statement-breakpoint
CREATE TABLE "datalogs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"owner_id" uuid NOT NULL,
	"combination_id" uuid NOT NULL,
	"revision" integer NOT NULL,
	"name" text NOT NULL,
	"file_name" text NOT NULL,
	"raw_text" text NOT NULL,
	"mapping" jsonb NOT NULL,
	"ambient" jsonb,
	"point_count" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "lesson_members" (
	"lesson_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"joined_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "lesson_steps" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lesson_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"title" text NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"items" jsonb NOT NULL,
	"series" jsonb DEFAULT '["boost","netPower"]'::jsonb NOT NULL
);
--> statement-breakpoint
CREATE TABLE "lessons" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"owner_id" uuid NOT NULL,
	"title" text NOT NULL,
	"summary" text DEFAULT '' NOT NULL,
	"class_code" text NOT NULL,
	"published" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "lessons_class_code_unique" UNIQUE("class_code")
);
--> statement-breakpoint
CREATE TABLE "pulleys" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"part_number" text NOT NULL,
	"position" "pulley_position" NOT NULL,
	"diameter" double precision NOT NULL,
	"rib_count" integer NOT NULL,
	"min_belt_diameter" double precision,
	"price" numeric(12, 2) NOT NULL,
	"stock" integer DEFAULT 0 NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "pulleys_part_number_unique" UNIQUE("part_number")
);
--> statement-breakpoint
CREATE TABLE "recommendations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"combination_id" uuid NOT NULL,
	"revision" integer NOT NULL,
	"author_id" uuid NOT NULL,
	"customer_name" text NOT NULL,
	"customer_email" text,
	"vehicle_notes" text DEFAULT '' NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"blower_pulley_diameter" double precision NOT NULL,
	"spec" jsonb NOT NULL,
	"parts" jsonb NOT NULL,
	"total" numeric(12, 2) NOT NULL,
	"status" "recommendation_status" DEFAULT 'draft' NOT NULL,
	"sent_at" timestamp with time zone,
	"last_error" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "shop_settings" (
	"id" integer PRIMARY KEY DEFAULT 1 NOT NULL,
	"name" text NOT NULL,
	"address" text DEFAULT '' NOT NULL,
	"phone" text DEFAULT '' NOT NULL,
	"email" text DEFAULT '' NOT NULL,
	"website" text DEFAULT '' NOT NULL
);
--> statement-breakpoint
CREATE TABLE "sign_in_attempts" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"email" text NOT NULL,
	"ip" text NOT NULL,
	"success" boolean NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "users" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"email" text NOT NULL,
	"name" text DEFAULT '' NOT NULL,
	"password_hash" text,
	"role" "role" DEFAULT 'member' NOT NULL,
	"unit_system" "unit_system" DEFAULT 'imperial' NOT NULL,
	"disabled" boolean DEFAULT false NOT NULL,
	"email_verified_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "users_email_unique" UNIQUE("email")
);
--> statement-breakpoint
ALTER TABLE "auth_tokens" ADD CONSTRAINT "auth_tokens_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "combination_revisions" ADD CONSTRAINT "combination_revisions_combination_id_combinations_id_fk" FOREIGN KEY ("combination_id") REFERENCES "public"."combinations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "combination_revisions" ADD CONSTRAINT "combination_revisions_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "combinations" ADD CONSTRAINT "combinations_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "datalog_points" ADD CONSTRAINT "datalog_points_datalog_id_datalogs_id_fk" FOREIGN KEY ("datalog_id") REFERENCES "public"."datalogs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "datalogs" ADD CONSTRAINT "datalogs_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "datalogs" ADD CONSTRAINT "datalogs_combination_id_combinations_id_fk" FOREIGN KEY ("combination_id") REFERENCES "public"."combinations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "lesson_members" ADD CONSTRAINT "lesson_members_lesson_id_lessons_id_fk" FOREIGN KEY ("lesson_id") REFERENCES "public"."lessons"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "lesson_members" ADD CONSTRAINT "lesson_members_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "lesson_steps" ADD CONSTRAINT "lesson_steps_lesson_id_lessons_id_fk" FOREIGN KEY ("lesson_id") REFERENCES "public"."lessons"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "lessons" ADD CONSTRAINT "lessons_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recommendations" ADD CONSTRAINT "recommendations_combination_id_combinations_id_fk" FOREIGN KEY ("combination_id") REFERENCES "public"."combinations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recommendations" ADD CONSTRAINT "recommendations_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "combination_revisions_number_idx" ON "combination_revisions" USING btree ("combination_id","number");--> statement-breakpoint
CREATE INDEX "combinations_owner_idx" ON "combinations" USING btree ("owner_id","updated_at");--> statement-breakpoint
CREATE INDEX "combinations_name_idx" ON "combinations" USING btree ("name");--> statement-breakpoint
CREATE INDEX "combinations_updated_idx" ON "combinations" USING btree ("updated_at");--> statement-breakpoint
CREATE INDEX "datalog_points_log_idx" ON "datalog_points" USING btree ("datalog_id","seq");--> statement-breakpoint
CREATE INDEX "datalogs_owner_idx" ON "datalogs" USING btree ("owner_id","created_at");--> statement-breakpoint
CREATE INDEX "datalogs_combination_idx" ON "datalogs" USING btree ("combination_id");--> statement-breakpoint
CREATE UNIQUE INDEX "lesson_members_idx" ON "lesson_members" USING btree ("lesson_id","user_id");--> statement-breakpoint
CREATE INDEX "lesson_steps_lesson_idx" ON "lesson_steps" USING btree ("lesson_id","position");--> statement-breakpoint
CREATE INDEX "pulleys_position_idx" ON "pulleys" USING btree ("position","diameter");--> statement-breakpoint
CREATE INDEX "recommendations_author_idx" ON "recommendations" USING btree ("author_id","updated_at");--> statement-breakpoint
CREATE INDEX "sign_in_attempts_email_idx" ON "sign_in_attempts" USING btree ("email","created_at");--> statement-breakpoint
CREATE INDEX "sign_in_attempts_ip_idx" ON "sign_in_attempts" USING btree ("ip","created_at");