/**
 * Loading of the protection engine's data tables (CSV files under {@code engine/protection/} on the
 * classpath). Each file carries its own source and confidence in comment lines, which this package
 * keeps beside the numbers.
 */
package com.wayledger.engine.protection.data;
