package com.wayledger.board;

/**
 * The schedule store contract on the embedded H2 database (PostgreSQL mode), as the default run
 * uses.
 */
class H2ScheduleStoreIntegrationTests extends ScheduleStoreContract {}
