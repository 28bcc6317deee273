/**
 * Grading of measured inspection and test results: each value against its published limit (or a
 * named common-practice rule), observations' urgency classes and the overall outcome, and drift
 * between two inspections. Plain Java: results and recorded circuit data in, graded values out.
 */
package com.wayledger.engine.inspection;
