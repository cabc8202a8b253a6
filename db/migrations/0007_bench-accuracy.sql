ALTER TABLE "bench_profiles" ADD COLUMN "voltage_accuracy_pct" real;--> statement-breakpoint
ALTER TABLE "bench_profiles" ADD COLUMN "voltage_offset_v" real;--> statement-breakpoint
ALTER TABLE "bench_profiles" ADD COLUMN "voltage_resolution_v" real;--> statement-breakpoint
ALTER TABLE "bench_profiles" ADD COLUMN "current_accuracy_pct" real;--> statement-breakpoint
ALTER TABLE "bench_profiles" ADD COLUMN "current_offset_a" real;--> statement-breakpoint
ALTER TABLE "bench_profiles" ADD COLUMN "current_resolution_a" real;--> statement-breakpoint
ALTER TABLE "bench_profiles" ADD COLUMN "temperature_accuracy_pct" real;--> statement-breakpoint
ALTER TABLE "bench_profiles" ADD COLUMN "temperature_offset_c" real;--> statement-breakpoint
ALTER TABLE "bench_profiles" ADD COLUMN "temperature_resolution_c" real;--> statement-breakpoint
ALTER TABLE "bench_profiles" ADD COLUMN "sampling_interval_s" real;