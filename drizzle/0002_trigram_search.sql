-- Trigram indexes make the list searches ("part of a name, title or street") index scans
-- instead of full reads as a company's projects grow. pg_trgm ships with PostgreSQL (contrib).
CREATE EXTENSION IF NOT EXISTS pg_trgm;
