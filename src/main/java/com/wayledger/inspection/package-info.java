/**
 * Inspection and testing: dated, append-only test records of a board (results per circuit, board
 * results, observations with urgency, outcome), graded by the engine, compared between two dates
 * and printed as a PDF. It reads boards and the change log but changes neither.
 */
package com.wayledger.inspection;
