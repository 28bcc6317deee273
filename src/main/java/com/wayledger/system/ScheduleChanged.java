package com.wayledger.system;

/**
 * Published inside the transaction of every change to a site, board, circuit or load, so that the
 * change log (package loadlog) records it in the same transaction: no change is stored without its
 * entry. Features publish it; they never depend on the log itself.
 *
 * @param siteId the site the change belongs to
 * @param boardId the board, or null for a change to the site itself
 * @param circuitId the circuit, or null for a change to a board or site
 * @param kind what happened
 * @param summary one line for a person, e.g. "Way 3 L2 “Oven” added"
 * @param before snapshot of the changed thing before the change (a record, written as JSON); null
 *     when added
 * @param after snapshot after the change; null when removed
 * @param reason why, as the user gave it (e.g. a work-order number); null when none was given
 */
public record ScheduleChanged(
    long siteId,
    Long boardId,
    Long circuitId,
    ChangeKind kind,
    String summary,
    Object before,
    Object after,
    String reason) {}
