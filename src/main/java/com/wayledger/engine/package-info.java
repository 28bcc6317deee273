/**
 * The pure calculation core: plain Java records in, records out, no framework imports. The shared
 * vocabulary of the trade (phases, load categories, devices, cables) lives here so that every
 * feature and every calculation speaks the same words; an architecture test keeps it free of
 * Spring, JPA and POI.
 */
package com.wayledger.engine;
