package com.wayledger.board;

import org.springframework.ui.Model;

/**
 * Where the circuit editor's own page goes back to after Save or Cancel: the page it was opened
 * from. A closed list, not a URL from the request, so a link cannot send a user elsewhere.
 */
enum ReturnTo {
  /** The board page with its schedule. */
  BOARD,
  /** The circuit's checks page. */
  CHECKS;

  /** The value of a {@code back} request parameter; anything unknown goes back to the board. */
  static ReturnTo of(String back) {
    return "checks".equalsIgnoreCase(back) ? CHECKS : BOARD;
  }

  String url(Long circuitId, long boardId) {
    return this == CHECKS && circuitId != null ? "/circuits/" + circuitId : "/boards/" + boardId;
  }

  /**
   * Marks the editor as standing on its own page: plain form posts (no row to swap into), a hidden
   * {@code back} field, and Cancel as a link to {@link #url}.
   */
  void standalone(Model model, Long circuitId, long boardId) {
    model.addAttribute("back", name().toLowerCase(java.util.Locale.ROOT));
    model.addAttribute("backUrl", url(circuitId, boardId));
  }
}
