-- User-defined diversity methods: copies of a built-in method with edited factors. The definition is the
-- engine's method as JSON (groups, categories, rules and their parameters); built-in methods live in code.
CREATE TABLE diversity_method (
    method_key      VARCHAR(60)   PRIMARY KEY,
    name            VARCHAR(120)  NOT NULL,
    based_on        VARCHAR(60),
    definition      VARCHAR(200000) NOT NULL,
    updated_by      VARCHAR(60),
    updated_at      TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT CURRENT_TIMESTAMP,
    version         BIGINT        NOT NULL DEFAULT 0
);
