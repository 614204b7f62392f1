-- Saved signatures move from users to user_signatures (the next migration drops the old columns).
INSERT INTO "user_signatures" ("user_id", "company_id", "typed", "drawn_png_data_url", "updated_at")
SELECT "id", "company_id", "signature_typed", "signature_data_url", "updated_at"
FROM "users"
WHERE "signature_typed" IS NOT NULL OR "signature_data_url" IS NOT NULL
ON CONFLICT ("user_id") DO NOTHING;
