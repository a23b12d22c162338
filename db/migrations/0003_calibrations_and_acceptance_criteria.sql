CREATE TYPE "public"."calibration_specimen" AS ENUM('disk', 'tension_strip', 'bending_beam');--> statement-breakpoint
CREATE TABLE "acceptance_criteria" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lab_id" uuid NOT NULL,
	"project" text,
	"model_id" uuid,
	"max_residual_fringe_order" double precision,
	"max_residual_stress_mpa" double precision,
	"max_residual_fraction_of_test_order" double precision,
	"planned_load_n" double precision,
	"coverage_factor" double precision DEFAULT 2 NOT NULL,
	"reason" text,
	"created_at" timestamp (3) with time zone DEFAULT now() NOT NULL,
	"recorded_by_key_id" uuid,
	CONSTRAINT "acceptance_criteria_one_scope" CHECK (("acceptance_criteria"."project" is null) <> ("acceptance_criteria"."model_id" is null)),
	CONSTRAINT "acceptance_criteria_some_limit" CHECK (coalesce("acceptance_criteria"."max_residual_fringe_order", "acceptance_criteria"."max_residual_stress_mpa", "acceptance_criteria"."max_residual_fraction_of_test_order") is not null),
	CONSTRAINT "acceptance_criteria_order_range" CHECK ("acceptance_criteria"."max_residual_fringe_order" is null or ("acceptance_criteria"."max_residual_fringe_order" > 0 and "acceptance_criteria"."max_residual_fringe_order" <= 50)),
	CONSTRAINT "acceptance_criteria_stress_range" CHECK ("acceptance_criteria"."max_residual_stress_mpa" is null or ("acceptance_criteria"."max_residual_stress_mpa" > 0 and "acceptance_criteria"."max_residual_stress_mpa" <= 1000)),
	CONSTRAINT "acceptance_criteria_fraction_range" CHECK ("acceptance_criteria"."max_residual_fraction_of_test_order" is null or ("acceptance_criteria"."max_residual_fraction_of_test_order" > 0 and "acceptance_criteria"."max_residual_fraction_of_test_order" <= 1)),
	CONSTRAINT "acceptance_criteria_load_range" CHECK ("acceptance_criteria"."planned_load_n" is null or ("acceptance_criteria"."planned_load_n" > 0 and "acceptance_criteria"."planned_load_n" < 1e7)),
	CONSTRAINT "acceptance_criteria_coverage_range" CHECK ("acceptance_criteria"."coverage_factor" >= 1 and "acceptance_criteria"."coverage_factor" <= 3)
);
--> statement-breakpoint
CREATE TABLE "calibrations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lab_id" uuid NOT NULL,
	"batch_id" uuid NOT NULL,
	"specimen" "calibration_specimen" NOT NULL,
	"raw_inputs" jsonb NOT NULL,
	"wavelength_nm" double precision NOT NULL,
	"fringe_value_n_per_mm" double precision NOT NULL,
	"fringe_value_uncertainty_n_per_mm" double precision NOT NULL,
	"observed_at" timestamp (3) with time zone NOT NULL,
	"operator" text NOT NULL,
	"notes" text,
	"recorded_at" timestamp (3) with time zone DEFAULT now() NOT NULL,
	"recorded_by_key_id" uuid,
	CONSTRAINT "calibrations_wavelength_visible" CHECK ("calibrations"."wavelength_nm" between 380 and 780),
	CONSTRAINT "calibrations_fringe_value_range" CHECK ("calibrations"."fringe_value_n_per_mm" > 0 and "calibrations"."fringe_value_n_per_mm" < 10000),
	CONSTRAINT "calibrations_uncertainty_range" CHECK ("calibrations"."fringe_value_uncertainty_n_per_mm" >= 0),
	CONSTRAINT "calibrations_operator_not_blank" CHECK (length(trim("calibrations"."operator")) > 0),
	CONSTRAINT "calibrations_raw_inputs_object" CHECK (jsonb_typeof("calibrations"."raw_inputs") = 'object')
);
--> statement-breakpoint
ALTER TABLE "acceptance_criteria" ADD CONSTRAINT "acceptance_criteria_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "acceptance_criteria" ADD CONSTRAINT "acceptance_criteria_model_same_lab_fk" FOREIGN KEY ("lab_id","model_id") REFERENCES "public"."models"("lab_id","id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "calibrations" ADD CONSTRAINT "calibrations_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "calibrations" ADD CONSTRAINT "calibrations_batch_same_lab_fk" FOREIGN KEY ("lab_id","batch_id") REFERENCES "public"."batches"("lab_id","id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "acceptance_criteria_scope_idx" ON "acceptance_criteria" USING btree ("lab_id","model_id","project","created_at");--> statement-breakpoint
CREATE INDEX "calibrations_batch_idx" ON "calibrations" USING btree ("batch_id","observed_at");