package com.wayledger.board;

import com.wayledger.engine.Phase;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.CircuitDemand;
import com.wayledger.engine.dwelling.Worksheet;
import com.wayledger.engine.protection.BoardFindings;
import com.wayledger.engine.protection.CircuitFindings;
import com.wayledger.engine.protection.ProtectionSettings;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;
import java.util.Map;
import org.springframework.ui.Model;

/**
 * Everything the board page and its schedule fragments print, built once per site data generation
 * (and locale) by {@link SchedulePage} and kept beside the site's analysis: immutable, and holding
 * no entity, so one view serves every reader until the next change moves the generation on.
 *
 * <p>The model attribute names are the templates': see {@link #addTo}.
 */
record BoardPage(
    BoardView board,
    SiteView site,
    String feedingWay,
    PanelLayout panel,
    List<ScheduleLine> lines,
    int circuitCount,
    BoardDemand demand,
    Map<Long, CircuitDemand> circuitDemand,
    Decimals decimals,
    Map<Long, CircuitFindings> circuitFindings,
    Map<Long, Map<Verdict, Long>> circuitProblems,
    ScheduleLine.Words scheduleWords,
    List<Finding> problems,
    Map<Verdict, Long> problemCounts,
    BoardFindings boardFindings,
    FindingList findingLines,
    ProtectionSettings findingSettings,
    List<Worksheet> worksheets,
    Double dividingVolts,
    PhaseChart phaseChart,
    Map<Phase, Double> connectedAmps) {

  /**
   * Puts the view in a page's model; with {@code focusAfterWay}, the first free position at or
   * after that way takes the keyboard focus (a copy of its line, the kept lines untouched).
   */
  void addTo(Model model, Integer focusAfterWay) {
    model.addAttribute("board", board);
    model.addAttribute("site", site);
    model.addAttribute("feedingWay", feedingWay);
    model.addAttribute("panel", panel);
    model.addAttribute("lines", focusAfterWay == null ? lines : focused(focusAfterWay));
    model.addAttribute("circuitCount", circuitCount);
    model.addAttribute("demand", demand);
    model.addAttribute("circuitDemand", circuitDemand);
    model.addAttribute("decimals", decimals);
    model.addAttribute("circuitFindings", circuitFindings);
    model.addAttribute("circuitProblems", circuitProblems);
    model.addAttribute("scheduleWords", scheduleWords);
    model.addAttribute("problems", problems);
    model.addAttribute("problemCounts", problemCounts);
    model.addAttribute("boardFindings", boardFindings);
    model.addAttribute("findingLines", findingLines);
    model.addAttribute("findingSettings", findingSettings);
    model.addAttribute("worksheets", worksheets);
    if (dividingVolts != null) {
      model.addAttribute("dividingVolts", dividingVolts);
    }
    if (phaseChart != null) {
      model.addAttribute("phaseChart", phaseChart);
      model.addAttribute("connectedAmps", connectedAmps);
    }
  }

  private List<ScheduleLine> focused(int afterWay) {
    ScheduleLine first =
        lines.stream()
            .filter(line -> line.free() && Integer.parseInt(line.way()) >= afterWay)
            .findFirst()
            .orElse(null);
    return first == null
        ? lines
        : lines.stream().map(line -> line == first ? line.withAutofocus() : line).toList();
  }
}
