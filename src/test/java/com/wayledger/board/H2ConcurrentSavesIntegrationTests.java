package com.wayledger.board;

/** {@link ConcurrentSavesContract} on the embedded H2 database of the tests. */
class H2ConcurrentSavesIntegrationTests extends ConcurrentSavesContract {}
