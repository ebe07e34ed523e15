ALTER TABLE "sign_in_attempts" ADD COLUMN "client_key" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "users" ADD COLUMN "session_version" integer DEFAULT 1 NOT NULL;--> statement-breakpoint
CREATE INDEX "sign_in_attempts_client_at_idx" ON "sign_in_attempts" USING btree ("client_key","at");