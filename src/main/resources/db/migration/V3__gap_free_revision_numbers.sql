-- Revision numbers are 1, 2, 3, ... per design with no repeat and no gap, whatever the application does:
-- a repeat breaks revision_number_unique (V1); a gap breaks the foreign key below, because every revision after
-- the first names its predecessor's number, which must exist in the same design. Revisions saved before this
-- migration were numbered by the same rule, so their predecessors exist.
ALTER TABLE revision ADD COLUMN previous_number INTEGER;
UPDATE revision SET previous_number = revision_number - 1 WHERE revision_number > 1;
ALTER TABLE revision ADD CONSTRAINT revision_number_follows_previous CHECK (
    (revision_number = 1 AND previous_number IS NULL)
    OR (revision_number > 1 AND previous_number IS NOT NULL AND previous_number = revision_number - 1));
ALTER TABLE revision ADD CONSTRAINT revision_previous_exists
    FOREIGN KEY (design_id, previous_number) REFERENCES revision (design_id, revision_number);
