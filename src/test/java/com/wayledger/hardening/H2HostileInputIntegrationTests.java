package com.wayledger.hardening;

/** The hostile-input contract on the embedded H2 database in PostgreSQL mode. */
class H2HostileInputIntegrationTests extends HostileInputContract {}
