-- Tool versions with build metadata (e.g. "1.4.0+20260301.g1a2b3c4d5e6f-dirty") can exceed 40 characters.
-- SET DATA TYPE is the SQL-standard spelling that H2 and PostgreSQL both accept.
ALTER TABLE revision ALTER COLUMN tool_version SET DATA TYPE VARCHAR(100);
