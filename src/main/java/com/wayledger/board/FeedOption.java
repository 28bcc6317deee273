package com.wayledger.board;

import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.WayStatus;

/**
 * A circuit of a possible parent board, offered by name on the board form so that nobody types a
 * circuit's id: "way 3 L1 Kitchen".
 *
 * @param boardId the parent board
 * @param boardReference its name
 * @param circuitId the circuit
 * @param wayNumber its way
 * @param position its line, words from the bundle
 * @param description what it feeds as recorded; may be empty
 * @param status in use, spare or empty
 */
public record FeedOption(
    long boardId,
    String boardReference,
    long circuitId,
    int wayNumber,
    PhasePosition position,
    String description,
    WayStatus status) {}
