/**
 * "Can it take it?": where a new load could go on a board or site. Every candidate position (a
 * spare way with a device, an empty position, an in-use circuit of the same kind of load) is tried
 * by adding the load to a copy of the site and re-running the demand and protection engines; the
 * candidates are ranked by what the change would do. Plain Java, records in and out, like the rest
 * of the engine.
 */
package com.wayledger.engine.capacity;
