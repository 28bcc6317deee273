package com.wayledger.loadlog;

import com.wayledger.system.ChangeKind;
import java.time.LocalDate;

/**
 * What a reader narrows the log to; every field is optional.
 *
 * @param boardId only entries about this board
 * @param username only entries by this user (exact name)
 * @param from only entries on or after this day (UTC)
 * @param to only entries on or before this day (UTC)
 * @param kind only entries of this kind
 */
public record LogFilter(
    Long boardId, String username, LocalDate from, LocalDate to, ChangeKind kind) {

  public static final LogFilter ALL = new LogFilter(null, null, null, null, null);

  public static LogFilter board(long boardId) {
    return new LogFilter(boardId, null, null, null, null);
  }
}
