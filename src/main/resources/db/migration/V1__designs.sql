-- Saved designs: one row per design, one row per immutable revision.
-- Plain SQL accepted unchanged by H2 2.5 and PostgreSQL 15: VARCHAR(n) for short text, TEXT for long text
-- (TEXT is a plain character string in both; no CLOB), TIMESTAMP WITH TIME ZONE holding UTC instants.
CREATE TABLE design (
    design_id          VARCHAR(32)  NOT NULL PRIMARY KEY,
    edit_token_hash    VARCHAR(64),
    demo_slug          VARCHAR(100) UNIQUE,
    latest_revision_id VARCHAR(32)  NOT NULL,
    latest_number      INTEGER      NOT NULL,
    created_at         TIMESTAMP WITH TIME ZONE NOT NULL
);

CREATE TABLE revision (
    revision_id        VARCHAR(32)  NOT NULL PRIMARY KEY,
    design_id          VARCHAR(32)  NOT NULL REFERENCES design (design_id),
    revision_number    INTEGER      NOT NULL,
    parent_revision_id VARCHAR(32),
    title              VARCHAR(200) NOT NULL,
    notes              TEXT         NOT NULL,
    input_json         TEXT         NOT NULL,
    result_json        TEXT         NOT NULL,
    tool_version       VARCHAR(40)  NOT NULL,
    schema_version     INTEGER      NOT NULL,
    created_at         TIMESTAMP WITH TIME ZONE NOT NULL,
    CONSTRAINT revision_number_unique UNIQUE (design_id, revision_number)
);
