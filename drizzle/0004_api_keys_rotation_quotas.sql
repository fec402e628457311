CREATE TABLE "api_quotas" (
	"organisation_id" uuid PRIMARY KEY NOT NULL,
	"monthly_requests" integer NOT NULL,
	CONSTRAINT "api_quotas_monthly_non_negative" CHECK ("api_quotas"."monthly_requests" >= 0)
);
--> statement-breakpoint
ALTER TABLE "api_keys" ALTER COLUMN "organisation_id" DROP NOT NULL;--> statement-breakpoint
ALTER TABLE "api_keys" ADD COLUMN "rate_per_minute" integer;--> statement-breakpoint
ALTER TABLE "api_keys" ADD COLUMN "rotated_from_id" uuid;--> statement-breakpoint
ALTER TABLE "api_quotas" ADD CONSTRAINT "api_quotas_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;