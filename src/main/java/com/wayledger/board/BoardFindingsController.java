package com.wayledger.board;

import com.wayledger.system.NotFoundException;
import jakarta.servlet.http.HttpServletRequest;
import org.springframework.context.MessageSource;
import org.springframework.context.i18n.LocaleContextHolder;
import org.springframework.stereotype.Controller;
import org.springframework.transaction.annotation.Transactional;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;

/**
 * The advice lines of a board's findings, fetched when the folded advice on the board page is
 * opened: the board page leaves them out, so that a view of a board with many advice lines prints
 * less. The board page filtered to advice ({@code ?severity=ADVICE}) prints them in place.
 */
@Controller
class BoardFindingsController {

  private final BoardRepository boards;
  private final CircuitRepository circuits;
  private final AnalysisService analysis;
  private final MessageSource messages;

  BoardFindingsController(
      BoardRepository boards,
      CircuitRepository circuits,
      AnalysisService analysis,
      MessageSource messages) {
    this.boards = boards;
    this.circuits = circuits;
    this.analysis = analysis;
    this.messages = messages;
  }

  @GetMapping("/boards/{id}/findings/advice")
  @Transactional(readOnly = true)
  public String advice(@PathVariable long id, Model model, HttpServletRequest request) {
    Board board = boards.findById(id).orElseThrow(() -> new NotFoundException("Board", id));
    model.addAttribute(
        "findingLines",
        FindingLines.ofBoard(
            id,
            analysis.ofSite(board.getSite().getId()),
            circuits.findByBoard(id),
            request.getContextPath(),
            new PageWords(messages, LocaleContextHolder.getLocale())));
    return "board/summary :: adviceLines";
  }
}
