CREATE TABLE "annealing_guidance_entries" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lab_id" uuid,
	"key" text NOT NULL,
	"title" text NOT NULL,
	"material_family" "material_family" NOT NULL,
	"catalogue_version" text,
	"catalogue_position" integer,
	"entry" jsonb NOT NULL,
	"supersedes_id" uuid,
	"amendment_reason" text,
	"created_at" timestamp (3) with time zone DEFAULT now() NOT NULL,
	"recorded_by_key_id" uuid,
	CONSTRAINT "annealing_guidance_published_has_version" CHECK (("annealing_guidance_entries"."lab_id" is null) = ("annealing_guidance_entries"."catalogue_version" is not null) and ("annealing_guidance_entries"."lab_id" is null) = ("annealing_guidance_entries"."catalogue_position" is not null)),
	CONSTRAINT "annealing_guidance_published_not_amended" CHECK ("annealing_guidance_entries"."lab_id" is not null or "annealing_guidance_entries"."supersedes_id" is null),
	CONSTRAINT "annealing_guidance_key_form" CHECK ("annealing_guidance_entries"."key" ~ '^[a-z0-9]+(-[a-z0-9]+)*([.][a-z0-9]+(-[a-z0-9]+)*)+$'),
	CONSTRAINT "annealing_guidance_title_not_blank" CHECK (length(trim("annealing_guidance_entries"."title")) > 0),
	CONSTRAINT "annealing_guidance_entry_matches" CHECK (jsonb_typeof("annealing_guidance_entries"."entry") = 'object' and "annealing_guidance_entries"."entry"->>'key' = "annealing_guidance_entries"."key" and "annealing_guidance_entries"."entry"->>'title' = "annealing_guidance_entries"."title"),
	CONSTRAINT "annealing_guidance_amendment_has_reason" CHECK (("annealing_guidance_entries"."supersedes_id" is null) = ("annealing_guidance_entries"."amendment_reason" is null))
);
--> statement-breakpoint
CREATE TABLE "annealing_house_cycles" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lab_id" uuid NOT NULL,
	"material_family" "material_family" NOT NULL,
	"guidance_entry_id" uuid NOT NULL,
	"reason" text,
	"mark_number" integer GENERATED ALWAYS AS IDENTITY (sequence name "annealing_house_cycles_mark_number_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"created_at" timestamp (3) with time zone DEFAULT now() NOT NULL,
	"recorded_by_key_id" uuid
);
--> statement-breakpoint
CREATE TABLE "annealing_plans" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lab_id" uuid NOT NULL,
	"model_id" uuid NOT NULL,
	"guidance_entry_id" uuid NOT NULL,
	"guidance_key" text NOT NULL,
	"catalogue_version" text,
	"chosen_by" text NOT NULL,
	"max_section_thickness_mm" double precision NOT NULL,
	"thickness_source" text NOT NULL,
	"start_temperature_c" double precision NOT NULL,
	"oven_limits" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"plan" jsonb NOT NULL,
	"total_duration_h" double precision NOT NULL,
	"max_temperature_c" double precision NOT NULL,
	"supersedes_id" uuid,
	"amendment_reason" text,
	"created_at" timestamp (3) with time zone DEFAULT now() NOT NULL,
	"recorded_by_key_id" uuid,
	CONSTRAINT "annealing_plans_lab_id_unique" UNIQUE("lab_id","id"),
	CONSTRAINT "annealing_plans_chosen_by" CHECK ("annealing_plans"."chosen_by" in ('requested', 'house_cycle', 'published_default')),
	CONSTRAINT "annealing_plans_thickness_source" CHECK ("annealing_plans"."thickness_source" in ('model', 'given')),
	CONSTRAINT "annealing_plans_thickness_range" CHECK ("annealing_plans"."max_section_thickness_mm" > 0 and "annealing_plans"."max_section_thickness_mm" <= 300),
	CONSTRAINT "annealing_plans_start_range" CHECK ("annealing_plans"."start_temperature_c" between -40 and 60),
	CONSTRAINT "annealing_plans_duration_range" CHECK ("annealing_plans"."total_duration_h" > 0 and "annealing_plans"."total_duration_h" < 10000),
	CONSTRAINT "annealing_plans_max_temperature_range" CHECK ("annealing_plans"."max_temperature_c" between -50 and 1600),
	CONSTRAINT "annealing_plans_plan_object" CHECK (jsonb_typeof("annealing_plans"."plan") = 'object' and jsonb_typeof("annealing_plans"."plan"->'segments') = 'array'),
	CONSTRAINT "annealing_plans_ramp_rates_positive" CHECK (not jsonb_path_exists("annealing_plans"."plan", '$.segments[*] ? (@.kind == "ramp" && !(@.rateCPerH > 0))')),
	CONSTRAINT "annealing_plans_segments_physical" CHECK (not jsonb_path_exists("annealing_plans"."plan", '$.segments[*] ? (@.startTemperatureC < -50 || @.startTemperatureC > 1600 || @.endTemperatureC < -50 || @.endTemperatureC > 1600 || @.durationH < 0 || @.startH < 0)')),
	CONSTRAINT "annealing_plans_amendment_has_reason" CHECK (("annealing_plans"."supersedes_id" is null) = ("annealing_plans"."amendment_reason" is null))
);
--> statement-breakpoint
CREATE TABLE "annealing_run_models" (
	"lab_id" uuid NOT NULL,
	"run_id" uuid NOT NULL,
	"model_id" uuid NOT NULL,
	CONSTRAINT "annealing_run_models_pk" PRIMARY KEY("run_id","model_id")
);
--> statement-breakpoint
CREATE TABLE "annealing_runs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lab_id" uuid NOT NULL,
	"plan_id" uuid NOT NULL,
	"oven_name" text NOT NULL,
	"operator" text NOT NULL,
	"started_at" timestamp (3) with time zone NOT NULL,
	"notes" text,
	"supersedes_id" uuid,
	"amendment_reason" text,
	"created_at" timestamp (3) with time zone DEFAULT now() NOT NULL,
	"recorded_by_key_id" uuid,
	CONSTRAINT "annealing_runs_lab_id_unique" UNIQUE("lab_id","id"),
	CONSTRAINT "annealing_runs_oven_not_blank" CHECK (length(trim("annealing_runs"."oven_name")) > 0),
	CONSTRAINT "annealing_runs_operator_not_blank" CHECK (length(trim("annealing_runs"."operator")) > 0),
	CONSTRAINT "annealing_runs_amendment_has_reason" CHECK (("annealing_runs"."supersedes_id" is null) = ("annealing_runs"."amendment_reason" is null))
);
--> statement-breakpoint
CREATE TABLE "oven_log_samples" (
	"lab_id" uuid NOT NULL,
	"log_id" uuid NOT NULL,
	"seq" integer NOT NULL,
	"elapsed_h" double precision NOT NULL,
	"observed_at" timestamp (3) with time zone,
	"temperature_c" double precision NOT NULL,
	CONSTRAINT "oven_log_samples_pk" PRIMARY KEY("log_id","seq"),
	CONSTRAINT "oven_log_samples_seq_range" CHECK ("oven_log_samples"."seq" >= 0),
	CONSTRAINT "oven_log_samples_elapsed_range" CHECK ("oven_log_samples"."elapsed_h" >= 0 and "oven_log_samples"."elapsed_h" < 10000),
	CONSTRAINT "oven_log_samples_temperature_range" CHECK ("oven_log_samples"."temperature_c" between -50 and 1600)
);
--> statement-breakpoint
CREATE TABLE "oven_logs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lab_id" uuid NOT NULL,
	"run_id" uuid NOT NULL,
	"time_column" text NOT NULL,
	"sample_count" integer NOT NULL,
	"duration_h" double precision NOT NULL,
	"min_temperature_c" double precision NOT NULL,
	"max_temperature_c" double precision NOT NULL,
	"verdict" text NOT NULL,
	"comparison" jsonb NOT NULL,
	"body_sha256" text NOT NULL,
	"supersedes_id" uuid,
	"amendment_reason" text,
	"imported_at" timestamp (3) with time zone DEFAULT now() NOT NULL,
	"imported_by_key_id" uuid,
	CONSTRAINT "oven_logs_lab_id_unique" UNIQUE("lab_id","id"),
	CONSTRAINT "oven_logs_time_column" CHECK ("oven_logs"."time_column" in ('elapsed_h', 'elapsed_min', 'timestamp')),
	CONSTRAINT "oven_logs_sample_count" CHECK ("oven_logs"."sample_count" >= 2),
	CONSTRAINT "oven_logs_duration_range" CHECK ("oven_logs"."duration_h" >= 0 and "oven_logs"."duration_h" < 10000),
	CONSTRAINT "oven_logs_temperature_range" CHECK ("oven_logs"."min_temperature_c" between -50 and 1600 and "oven_logs"."max_temperature_c" between -50 and 1600 and "oven_logs"."min_temperature_c" <= "oven_logs"."max_temperature_c"),
	CONSTRAINT "oven_logs_verdict" CHECK ("oven_logs"."verdict" in ('pass', 'pass_with_remarks', 'fail')),
	CONSTRAINT "oven_logs_digest_is_sha256_hex" CHECK ("oven_logs"."body_sha256" ~ '^[0-9a-f]{64}$'),
	CONSTRAINT "oven_logs_amendment_has_reason" CHECK (("oven_logs"."supersedes_id" is null) = ("oven_logs"."amendment_reason" is null))
);
--> statement-breakpoint
ALTER TABLE "annealing_guidance_entries" ADD CONSTRAINT "annealing_guidance_entries_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "annealing_guidance_entries" ADD CONSTRAINT "annealing_guidance_entries_supersedes_id_annealing_guidance_entries_id_fk" FOREIGN KEY ("supersedes_id") REFERENCES "public"."annealing_guidance_entries"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "annealing_house_cycles" ADD CONSTRAINT "annealing_house_cycles_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "annealing_house_cycles" ADD CONSTRAINT "annealing_house_cycles_guidance_entry_id_annealing_guidance_entries_id_fk" FOREIGN KEY ("guidance_entry_id") REFERENCES "public"."annealing_guidance_entries"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "annealing_plans" ADD CONSTRAINT "annealing_plans_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "annealing_plans" ADD CONSTRAINT "annealing_plans_guidance_entry_id_annealing_guidance_entries_id_fk" FOREIGN KEY ("guidance_entry_id") REFERENCES "public"."annealing_guidance_entries"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "annealing_plans" ADD CONSTRAINT "annealing_plans_supersedes_id_annealing_plans_id_fk" FOREIGN KEY ("supersedes_id") REFERENCES "public"."annealing_plans"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "annealing_plans" ADD CONSTRAINT "annealing_plans_model_same_lab_fk" FOREIGN KEY ("lab_id","model_id") REFERENCES "public"."models"("lab_id","id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "annealing_run_models" ADD CONSTRAINT "annealing_run_models_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "annealing_run_models" ADD CONSTRAINT "annealing_run_models_run_same_lab_fk" FOREIGN KEY ("lab_id","run_id") REFERENCES "public"."annealing_runs"("lab_id","id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "annealing_run_models" ADD CONSTRAINT "annealing_run_models_model_same_lab_fk" FOREIGN KEY ("lab_id","model_id") REFERENCES "public"."models"("lab_id","id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "annealing_runs" ADD CONSTRAINT "annealing_runs_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "annealing_runs" ADD CONSTRAINT "annealing_runs_supersedes_id_annealing_runs_id_fk" FOREIGN KEY ("supersedes_id") REFERENCES "public"."annealing_runs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "annealing_runs" ADD CONSTRAINT "annealing_runs_plan_same_lab_fk" FOREIGN KEY ("lab_id","plan_id") REFERENCES "public"."annealing_plans"("lab_id","id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "oven_log_samples" ADD CONSTRAINT "oven_log_samples_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "oven_log_samples" ADD CONSTRAINT "oven_log_samples_log_same_lab_fk" FOREIGN KEY ("lab_id","log_id") REFERENCES "public"."oven_logs"("lab_id","id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "oven_logs" ADD CONSTRAINT "oven_logs_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "oven_logs" ADD CONSTRAINT "oven_logs_supersedes_id_oven_logs_id_fk" FOREIGN KEY ("supersedes_id") REFERENCES "public"."oven_logs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "oven_logs" ADD CONSTRAINT "oven_logs_run_same_lab_fk" FOREIGN KEY ("lab_id","run_id") REFERENCES "public"."annealing_runs"("lab_id","id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "annealing_guidance_published_unique" ON "annealing_guidance_entries" USING btree ("key","catalogue_version") WHERE "annealing_guidance_entries"."lab_id" is null;--> statement-breakpoint
CREATE UNIQUE INDEX "annealing_guidance_lab_current_unique" ON "annealing_guidance_entries" USING btree ("lab_id","key") WHERE "annealing_guidance_entries"."lab_id" is not null and "annealing_guidance_entries"."supersedes_id" is null;--> statement-breakpoint
CREATE UNIQUE INDEX "annealing_guidance_one_successor" ON "annealing_guidance_entries" USING btree ("supersedes_id");--> statement-breakpoint
CREATE INDEX "annealing_guidance_family_idx" ON "annealing_guidance_entries" USING btree ("material_family","lab_id");--> statement-breakpoint
CREATE INDEX "annealing_house_cycles_scope_idx" ON "annealing_house_cycles" USING btree ("lab_id","material_family","mark_number");--> statement-breakpoint
CREATE UNIQUE INDEX "annealing_plans_one_successor" ON "annealing_plans" USING btree ("supersedes_id");--> statement-breakpoint
CREATE INDEX "annealing_plans_model_idx" ON "annealing_plans" USING btree ("model_id","created_at");--> statement-breakpoint
CREATE INDEX "annealing_run_models_model_idx" ON "annealing_run_models" USING btree ("model_id");--> statement-breakpoint
CREATE UNIQUE INDEX "annealing_runs_one_successor" ON "annealing_runs" USING btree ("supersedes_id");--> statement-breakpoint
CREATE INDEX "annealing_runs_lab_started_idx" ON "annealing_runs" USING btree ("lab_id","started_at","id");--> statement-breakpoint
CREATE UNIQUE INDEX "oven_logs_one_successor" ON "oven_logs" USING btree ("supersedes_id");--> statement-breakpoint
CREATE INDEX "oven_logs_run_idx" ON "oven_logs" USING btree ("run_id","imported_at");