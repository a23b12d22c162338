CREATE TYPE "public"."batch_kind" AS ENUM('cast_batch', 'sheet_lot');--> statement-breakpoint
CREATE TYPE "public"."event_kind" AS ENUM('cast', 'cured', 'machined', 'polished', 'annealed', 'loaded', 'unloaded', 'stored', 'inspected');--> statement-breakpoint
CREATE TYPE "public"."geometry_kind" AS ENUM('opposite_rounded_notches', 'opposite_sharp_sawn_notches', 'sharp_notches_with_relief_notches', 'compact_tension', 'calibration_disk', 'tension_strip', 'bending_beam', 'other');--> statement-breakpoint
CREATE TYPE "public"."key_role" AS ENUM('viewer', 'technician', 'admin');--> statement-breakpoint
CREATE TYPE "public"."material_family" AS ENUM('polycarbonate', 'anhydride_cured_epoxy', 'cast_acrylic', 'allyl_diglycol_carbonate', 'polyurethane_rubber', 'soda_lime_glass', 'other');--> statement-breakpoint
CREATE TYPE "public"."reading_method" AS ENUM('whole_order', 'tardy', 'senarmont', 'compensator', 'direct');--> statement-breakpoint
CREATE TYPE "public"."reading_sign" AS ENUM('positive', 'negative', 'unknown');--> statement-breakpoint
CREATE TYPE "public"."reading_stage" AS ENUM('before_load', 'under_load', 'after_unload', 'before_anneal', 'after_anneal', 'inspection');--> statement-breakpoint
CREATE TYPE "public"."site_kind" AS ENUM('notch_root', 'machined_edge', 'interior', 'calibration_point', 'other');--> statement-breakpoint
CREATE TABLE "api_keys" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lab_id" uuid NOT NULL,
	"label" text NOT NULL,
	"role" "key_role" NOT NULL,
	"key_hash" text NOT NULL,
	"key_prefix" text NOT NULL,
	"created_at" timestamp (3) with time zone DEFAULT now() NOT NULL,
	"revoked_at" timestamp (3) with time zone,
	CONSTRAINT "api_keys_key_hash_unique" UNIQUE("key_hash"),
	CONSTRAINT "api_keys_hash_is_sha256_hex" CHECK ("api_keys"."key_hash" ~ '^[0-9a-f]{64}$'),
	CONSTRAINT "api_keys_label_not_blank" CHECK (length(trim("api_keys"."label")) > 0)
);
--> statement-breakpoint
CREATE TABLE "labs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"created_at" timestamp (3) with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "labs_name_not_blank" CHECK (length(trim("labs"."name")) > 0)
);
--> statement-breakpoint
CREATE TABLE "batches" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lab_id" uuid NOT NULL,
	"material_id" uuid NOT NULL,
	"code" text NOT NULL,
	"kind" "batch_kind" NOT NULL,
	"supplier_lot" text,
	"made_on" timestamp (3) with time zone,
	"notes" text,
	"created_at" timestamp (3) with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "batches_lab_code_unique" UNIQUE("lab_id","code"),
	CONSTRAINT "batches_lab_id_unique" UNIQUE("lab_id","id"),
	CONSTRAINT "batches_code_not_blank" CHECK (length(trim("batches"."code")) > 0)
);
--> statement-breakpoint
CREATE TABLE "materials" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lab_id" uuid NOT NULL,
	"name" text NOT NULL,
	"family" "material_family" NOT NULL,
	"fringe_value_n_per_mm" double precision NOT NULL,
	"fringe_value_uncertainty_n_per_mm" double precision NOT NULL,
	"fringe_value_wavelength_nm" double precision NOT NULL,
	"elastic_modulus_gpa" double precision,
	"poisson_ratio" double precision,
	"glass_transition_c" double precision,
	"thermal_expansion_per_mk" double precision,
	"thermal_conductivity_w_per_mk" double precision,
	"density_kg_per_m3" double precision,
	"specific_heat_j_per_kg_k" double precision,
	"thermal_diffusivity_mm2_per_s" double precision,
	"sources" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"created_at" timestamp (3) with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "materials_lab_name_unique" UNIQUE("lab_id","name"),
	CONSTRAINT "materials_lab_id_unique" UNIQUE("lab_id","id"),
	CONSTRAINT "materials_name_not_blank" CHECK (length(trim("materials"."name")) > 0),
	CONSTRAINT "materials_fringe_value_positive" CHECK ("materials"."fringe_value_n_per_mm" > 0 and "materials"."fringe_value_n_per_mm" < 10000),
	CONSTRAINT "materials_fringe_value_uncertainty" CHECK ("materials"."fringe_value_uncertainty_n_per_mm" >= 0 and "materials"."fringe_value_uncertainty_n_per_mm" < "materials"."fringe_value_n_per_mm"),
	CONSTRAINT "materials_wavelength_visible" CHECK ("materials"."fringe_value_wavelength_nm" between 380 and 780),
	CONSTRAINT "materials_modulus_range" CHECK ("materials"."elastic_modulus_gpa" is null or ("materials"."elastic_modulus_gpa" > 0 and "materials"."elastic_modulus_gpa" < 1000)),
	CONSTRAINT "materials_poisson_range" CHECK ("materials"."poisson_ratio" is null or ("materials"."poisson_ratio" > 0 and "materials"."poisson_ratio" <= 0.5)),
	CONSTRAINT "materials_tg_range" CHECK ("materials"."glass_transition_c" is null or "materials"."glass_transition_c" between -150 and 1500),
	CONSTRAINT "materials_cte_range" CHECK ("materials"."thermal_expansion_per_mk" is null or ("materials"."thermal_expansion_per_mk" > 0 and "materials"."thermal_expansion_per_mk" < 1000)),
	CONSTRAINT "materials_conductivity_range" CHECK ("materials"."thermal_conductivity_w_per_mk" is null or ("materials"."thermal_conductivity_w_per_mk" > 0 and "materials"."thermal_conductivity_w_per_mk" < 100)),
	CONSTRAINT "materials_density_range" CHECK ("materials"."density_kg_per_m3" is null or ("materials"."density_kg_per_m3" > 100 and "materials"."density_kg_per_m3" < 20000)),
	CONSTRAINT "materials_heat_capacity_range" CHECK ("materials"."specific_heat_j_per_kg_k" is null or ("materials"."specific_heat_j_per_kg_k" > 10 and "materials"."specific_heat_j_per_kg_k" < 10000)),
	CONSTRAINT "materials_diffusivity_range" CHECK ("materials"."thermal_diffusivity_mm2_per_s" is null or ("materials"."thermal_diffusivity_mm2_per_s" > 0 and "materials"."thermal_diffusivity_mm2_per_s" < 100))
);
--> statement-breakpoint
CREATE TABLE "model_events" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lab_id" uuid NOT NULL,
	"model_id" uuid NOT NULL,
	"kind" "event_kind" NOT NULL,
	"occurred_at" timestamp (3) with time zone NOT NULL,
	"operator" text NOT NULL,
	"machining_method" text,
	"tool" text,
	"temperature_c" double precision,
	"relative_humidity_pct" double precision,
	"load_n" double precision,
	"notes" text,
	"details" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"recorded_at" timestamp (3) with time zone DEFAULT now() NOT NULL,
	"recorded_by_key_id" uuid,
	CONSTRAINT "model_events_operator_not_blank" CHECK (length(trim("model_events"."operator")) > 0),
	CONSTRAINT "model_events_machining_needs_method" CHECK ("model_events"."kind" <> 'machined' or "model_events"."machining_method" is not null),
	CONSTRAINT "model_events_temperature_range" CHECK ("model_events"."temperature_c" is null or "model_events"."temperature_c" between -80 and 1600),
	CONSTRAINT "model_events_humidity_range" CHECK ("model_events"."relative_humidity_pct" is null or "model_events"."relative_humidity_pct" between 0 and 100),
	CONSTRAINT "model_events_load_range" CHECK ("model_events"."load_n" is null or ("model_events"."load_n" >= 0 and "model_events"."load_n" < 1e7))
);
--> statement-breakpoint
CREATE TABLE "models" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lab_id" uuid NOT NULL,
	"batch_id" uuid NOT NULL,
	"code" text NOT NULL,
	"geometry_kind" geometry_kind NOT NULL,
	"thickness_mm" double precision NOT NULL,
	"thickness_uncertainty_mm" double precision NOT NULL,
	"gross_width_mm" double precision,
	"net_width_mm" double precision,
	"notch_depth_mm" double precision,
	"notch_root_radius_mm" double precision,
	"project" text,
	"notes" text,
	"created_at" timestamp (3) with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "models_lab_code_unique" UNIQUE("lab_id","code"),
	CONSTRAINT "models_lab_id_unique" UNIQUE("lab_id","id"),
	CONSTRAINT "models_code_not_blank" CHECK (length(trim("models"."code")) > 0),
	CONSTRAINT "models_thickness_range" CHECK ("models"."thickness_mm" > 0 and "models"."thickness_mm" <= 300),
	CONSTRAINT "models_thickness_uncertainty" CHECK ("models"."thickness_uncertainty_mm" >= 0 and "models"."thickness_uncertainty_mm" < "models"."thickness_mm"),
	CONSTRAINT "models_gross_width_range" CHECK ("models"."gross_width_mm" is null or ("models"."gross_width_mm" > 0 and "models"."gross_width_mm" <= 2000)),
	CONSTRAINT "models_net_width_range" CHECK ("models"."net_width_mm" is null or ("models"."net_width_mm" > 0 and ("models"."gross_width_mm" is null or "models"."net_width_mm" <= "models"."gross_width_mm"))),
	CONSTRAINT "models_notch_depth_range" CHECK ("models"."notch_depth_mm" is null or ("models"."notch_depth_mm" > 0 and ("models"."gross_width_mm" is null or 2 * "models"."notch_depth_mm" < "models"."gross_width_mm"))),
	CONSTRAINT "models_notch_radius_range" CHECK ("models"."notch_root_radius_mm" is null or ("models"."notch_root_radius_mm" >= 0 and "models"."notch_root_radius_mm" <= 500))
);
--> statement-breakpoint
CREATE TABLE "sites" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lab_id" uuid NOT NULL,
	"model_id" uuid NOT NULL,
	"label" text NOT NULL,
	"kind" "site_kind" NOT NULL,
	"on_free_edge" boolean NOT NULL,
	"local_thickness_mm" double precision,
	"notes" text,
	"created_at" timestamp (3) with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "sites_model_label_unique" UNIQUE("model_id","label"),
	CONSTRAINT "sites_lab_id_unique" UNIQUE("lab_id","id"),
	CONSTRAINT "sites_label_not_blank" CHECK (length(trim("sites"."label")) > 0),
	CONSTRAINT "sites_local_thickness_range" CHECK ("sites"."local_thickness_mm" is null or ("sites"."local_thickness_mm" > 0 and "sites"."local_thickness_mm" <= 300))
);
--> statement-breakpoint
CREATE TABLE "reading_imports" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lab_id" uuid NOT NULL,
	"format" text NOT NULL,
	"row_count" double precision NOT NULL,
	"idempotency_key" text,
	"imported_at" timestamp (3) with time zone DEFAULT now() NOT NULL,
	"imported_by_key_id" uuid,
	CONSTRAINT "reading_imports_format" CHECK ("reading_imports"."format" in ('csv', 'json'))
);
--> statement-breakpoint
CREATE TABLE "readings" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lab_id" uuid NOT NULL,
	"site_id" uuid NOT NULL,
	"stage" "reading_stage" NOT NULL,
	"load_n" double precision,
	"observed_at" timestamp (3) with time zone NOT NULL,
	"operator" text NOT NULL,
	"wavelength_nm" double precision,
	"method" "reading_method" NOT NULL,
	"raw_inputs" jsonb NOT NULL,
	"sign" "reading_sign" NOT NULL,
	"fringe_order" double precision NOT NULL,
	"fringe_order_uncertainty" double precision NOT NULL,
	"retardation_nm" double precision NOT NULL,
	"notes" text,
	"supersedes_id" uuid,
	"amendment_reason" text,
	"import_id" uuid,
	"recorded_at" timestamp (3) with time zone DEFAULT now() NOT NULL,
	"recorded_by_key_id" uuid,
	CONSTRAINT "readings_operator_not_blank" CHECK (length(trim("readings"."operator")) > 0),
	CONSTRAINT "readings_load_only_under_load" CHECK (("readings"."stage" = 'under_load') = ("readings"."load_n" is not null)),
	CONSTRAINT "readings_load_range" CHECK ("readings"."load_n" is null or ("readings"."load_n" > 0 and "readings"."load_n" < 1e7)),
	CONSTRAINT "readings_wavelength_visible" CHECK ("readings"."wavelength_nm" is null or "readings"."wavelength_nm" between 380 and 780),
	CONSTRAINT "readings_fringe_order_range" CHECK ("readings"."fringe_order" >= 0 and "readings"."fringe_order" <= 200),
	CONSTRAINT "readings_uncertainty_range" CHECK ("readings"."fringe_order_uncertainty" >= 0 and "readings"."fringe_order_uncertainty" <= 10),
	CONSTRAINT "readings_retardation_range" CHECK ("readings"."retardation_nm" >= 0),
	CONSTRAINT "readings_amendment_has_reason" CHECK (("readings"."supersedes_id" is null) = ("readings"."amendment_reason" is null)),
	CONSTRAINT "readings_amendment_reason_not_blank" CHECK ("readings"."amendment_reason" is null or length(trim("readings"."amendment_reason")) > 0),
	CONSTRAINT "readings_raw_inputs_object" CHECK (jsonb_typeof("readings"."raw_inputs") = 'object')
);
--> statement-breakpoint
ALTER TABLE "api_keys" ADD CONSTRAINT "api_keys_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "batches" ADD CONSTRAINT "batches_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "batches" ADD CONSTRAINT "batches_material_same_lab_fk" FOREIGN KEY ("lab_id","material_id") REFERENCES "public"."materials"("lab_id","id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "materials" ADD CONSTRAINT "materials_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "model_events" ADD CONSTRAINT "model_events_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "model_events" ADD CONSTRAINT "model_events_model_same_lab_fk" FOREIGN KEY ("lab_id","model_id") REFERENCES "public"."models"("lab_id","id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "models" ADD CONSTRAINT "models_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "models" ADD CONSTRAINT "models_batch_same_lab_fk" FOREIGN KEY ("lab_id","batch_id") REFERENCES "public"."batches"("lab_id","id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sites" ADD CONSTRAINT "sites_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sites" ADD CONSTRAINT "sites_model_same_lab_fk" FOREIGN KEY ("lab_id","model_id") REFERENCES "public"."models"("lab_id","id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reading_imports" ADD CONSTRAINT "reading_imports_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "readings" ADD CONSTRAINT "readings_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "readings" ADD CONSTRAINT "readings_supersedes_id_readings_id_fk" FOREIGN KEY ("supersedes_id") REFERENCES "public"."readings"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "readings" ADD CONSTRAINT "readings_import_id_reading_imports_id_fk" FOREIGN KEY ("import_id") REFERENCES "public"."reading_imports"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "readings" ADD CONSTRAINT "readings_site_same_lab_fk" FOREIGN KEY ("lab_id","site_id") REFERENCES "public"."sites"("lab_id","id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "api_keys_lab_idx" ON "api_keys" USING btree ("lab_id");--> statement-breakpoint
CREATE INDEX "batches_material_idx" ON "batches" USING btree ("material_id");--> statement-breakpoint
CREATE INDEX "model_events_model_time_idx" ON "model_events" USING btree ("model_id","occurred_at");--> statement-breakpoint
CREATE INDEX "models_batch_idx" ON "models" USING btree ("batch_id");--> statement-breakpoint
CREATE UNIQUE INDEX "reading_imports_idempotency_unique" ON "reading_imports" USING btree ("lab_id","idempotency_key");--> statement-breakpoint
CREATE UNIQUE INDEX "readings_one_successor" ON "readings" USING btree ("supersedes_id");--> statement-breakpoint
CREATE INDEX "readings_site_stage_idx" ON "readings" USING btree ("site_id","stage","observed_at");--> statement-breakpoint
CREATE INDEX "readings_lab_recorded_idx" ON "readings" USING btree ("lab_id","recorded_at","id");