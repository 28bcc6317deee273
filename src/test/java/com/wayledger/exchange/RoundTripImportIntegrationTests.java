package com.wayledger.exchange;

import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.context.ActiveProfiles;

/** {@link RoundTripImportChecks} on the embedded H2 database. */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class RoundTripImportIntegrationTests extends RoundTripImportChecks {}
