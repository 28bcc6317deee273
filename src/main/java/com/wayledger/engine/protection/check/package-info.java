/**
 * One class per protection or cable check, each turning plain numbers (and the device and fault
 * figures worked out elsewhere) into a {@link com.wayledger.engine.protection.result.Finding}. The
 * innermost functions take numbers, so tests can feed them values typed from a table.
 */
package com.wayledger.engine.protection.check;
