/**
 * NEC Article 220 dwelling load calculations laid out line by line: the standard method (Part III),
 * the feeder and service neutral (220.61), the optional method (220.82), additions to an existing
 * dwelling (220.83) and the existing load from a year of recorded maximum demand (220.87). Pure
 * Java; inputs are plain records and every result is a {@link
 * com.wayledger.engine.dwelling.Worksheet} of labelled lines.
 */
package com.wayledger.engine.dwelling;
