package com.wayledger.balance;

import com.wayledger.balance.BalancePlans.Basis;
import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.board.Placement;
import com.wayledger.board.ScheduleService;
import com.wayledger.system.RuleViolation;
import com.wayledger.system.StaleEditException;
import java.util.ArrayList;
import java.util.List;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

/**
 * The balancing page of a board: current against proposed, the move list, the k-moves table, apply
 * and undo.
 */
@Controller
public class BalanceController {

  private final BalanceService balancing;
  private final BoardService boards;
  private final ScheduleService schedule;

  public BalanceController(
      BalanceService balancing, BoardService boards, ScheduleService schedule) {
    this.balancing = balancing;
    this.boards = boards;
    this.schedule = schedule;
  }

  @GetMapping("/boards/{id}/balance")
  public String page(
      @PathVariable long id,
      @RequestParam(defaultValue = "DEMAND") Basis basis,
      @RequestParam(required = false) Integer moves,
      Model model) {
    Board board = boards.get(id);
    model.addAttribute("board", board);
    model.addAttribute("site", board.getSite());
    // The token first: a change saved while the plans are worked out makes the plan stale.
    model.addAttribute("scheduleToken", schedule.scheduleToken(id));
    model.addAttribute("plans", balancing.plans(id, basis, moves));
    model.addAttribute("chosenMoves", moves);
    model.addAttribute("bases", Basis.values());
    return "balance/board";
  }

  @PostMapping("/boards/{id}/balance/apply")
  public String apply(
      @PathVariable long id,
      @RequestParam String placements,
      @RequestParam(required = false, defaultValue = "") String undo,
      @RequestParam String version,
      @RequestParam(required = false, defaultValue = "") String reason,
      @RequestParam(required = false, defaultValue = "false") boolean undoing,
      RedirectAttributes redirect) {
    List<Placement> parsed = parse(placements);
    if (parsed == null || parsed.isEmpty()) {
      redirect.addFlashAttribute("problem", "balance.plan.malformed");
      return "redirect:/boards/" + id + "/balance";
    }
    try {
      schedule.rearrange(id, version, parsed, reason.isBlank() ? null : reason.strip());
      if (undoing) {
        // the moves were put back: say so, and offer no undo of the undo
        redirect.addFlashAttribute("undone", parsed.size());
      } else {
        redirect.addFlashAttribute("applied", parsed.size());
        redirect.addFlashAttribute("undoTokens", undo);
      }
    } catch (RuleViolation violation) {
      redirect.addFlashAttribute("problem", violation.messageCode());
    } catch (StaleEditException stale) {
      redirect.addFlashAttribute("problem", "balance.plan.stale");
    }
    return "redirect:/boards/" + id + "/balance";
  }

  /** "12:4:L2 13:5:L1" to placements; null when any token is malformed. */
  static List<Placement> parse(String tokens) {
    List<Placement> placements = new ArrayList<>();
    for (String token : tokens.strip().split("\\s+")) {
      if (token.isEmpty()) {
        continue;
      }
      Placement placement = Placement.parse(token);
      if (placement == null) {
        return null;
      }
      placements.add(placement);
    }
    return placements;
  }
}
