package com.wayledger.hardening;

/** Generated bad input on the embedded H2 database in PostgreSQL mode. */
class H2GeneratedBadInputIntegrationTests extends GeneratedBadInputContract {}
