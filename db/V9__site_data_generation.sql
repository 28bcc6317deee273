-- A counter per site that every committed change to the site's data moves on by one (system.SiteGenerations,
-- driven by the ScheduleChanged event every change publishes). Stored analyses are keyed by site and
-- generation, so a read after no change reuses the analysis and a read after any change, from any
-- instance sharing the database, computes it again. It is not an optimistic-lock version: concurrent
-- changes both increment it and neither is refused because of it.
ALTER TABLE site ADD COLUMN data_generation BIGINT NOT NULL DEFAULT 0;
