package com.wayledger.loadlog;

import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.RequestParam;

/**
 * The page a door chart's code opens: a board on a phone, with a banner saying whether anything
 * changed since the chart was printed. A malformed date or position in the link is ignored (the
 * page says so) rather than refused, since the person holding the phone cannot fix the printout.
 */
@Controller
public class LiveBoardController {

  private final LiveBoard live;

  public LiveBoardController(LiveBoard live) {
    this.live = live;
  }

  @GetMapping("/boards/{id}/live")
  public String live(
      @PathVariable long id,
      @RequestParam(required = false) String printed,
      @RequestParam(required = false) String at,
      Model model) {
    Long position = position(at);
    LocalDate printedOn = date(printed);
    model.addAttribute("live", live.view(id, position, printedOn));
    model.addAttribute(
        "linkDamaged", (at != null && position == null) || (printed != null && printedOn == null));
    return "loadlog/live";
  }

  private static Long position(String text) {
    if (text == null) {
      return null;
    }
    try {
      long value = Long.parseLong(text.strip());
      return value < 0 ? null : value;
    } catch (NumberFormatException e) {
      return null;
    }
  }

  private static LocalDate date(String text) {
    if (text == null) {
      return null;
    }
    try {
      return LocalDate.parse(text.strip());
    } catch (DateTimeParseException e) {
      return null;
    }
  }
}
