package com.wayledger.check;

import com.wayledger.board.AnalysisService;
import com.wayledger.board.Circuit;
import com.wayledger.board.Inheritance;
import com.wayledger.board.InheritedNote;
import com.wayledger.board.LoadItem;
import com.wayledger.board.ScheduleService;
import com.wayledger.board.SiteAnalysis;
import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.demand.CircuitDemand;
import com.wayledger.engine.protection.CircuitFindings;
import com.wayledger.engine.protection.DeviceProposal;
import com.wayledger.engine.protection.ProtectionSettings;
import com.wayledger.engine.protection.device.DeviceCharacteristic;
import com.wayledger.engine.protection.device.TimeCurrentBand;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Resolved;
import com.wayledger.system.RuleViolation;
import java.util.List;
import java.util.Objects;
import org.springframework.context.MessageSource;
import org.springframework.context.i18n.LocaleContextHolder;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

/**
 * One circuit as the checks see it: its findings with the numbers behind them, the lowest device
 * that passes every check at once (with "apply" for editors), and its time–current chart.
 */
@Controller
public class CircuitCheckController {

  private final ScheduleService schedule;
  private final AnalysisService analysis;
  private final MessageSource messages;

  public CircuitCheckController(
      ScheduleService schedule, AnalysisService analysis, MessageSource messages) {
    this.schedule = schedule;
    this.analysis = analysis;
    this.messages = messages;
  }

  @GetMapping("/circuits/{id}")
  public String circuit(@PathVariable long id, Model model) {
    Circuit circuit = schedule.circuit(id);
    long boardId = circuit.getBoard().getId();
    SiteAnalysis results = analysis.ofBoard(boardId);
    CircuitDemand demand = results.circuitDemands(boardId).get(id);
    CircuitFindings findings = results.circuitFindings(boardId).get(id);
    List<LoadItem> loads = schedule.loadsOf(id);
    model.addAttribute("circuit", circuit);
    model.addAttribute("board", circuit.getBoard());
    model.addAttribute("site", circuit.getBoard().getSite());
    model.addAttribute("loads", loads);
    // "Used: ambient 30 °C (board default)" beside each finding whose check took such a value
    model.addAttribute(
        "inheritedNotes",
        InheritedNote.byCheck(
            new Inheritance.Values(schedule.inheritedBy(id)),
            findings == null
                ? List.of()
                : findings.findings().stream().map(Finding::check).toList(),
            messages,
            LocaleContextHolder.getLocale()));
    model.addAttribute("demand", demand);
    model.addAttribute("circuitFindings", findings);
    model.addAttribute("settings", results.findings().settings());
    model.addAttribute("proposal", proposal(results, id, demand));
    CircuitSpec spec = specOf(results, id);
    if (spec != null && spec.device() != null && spec.device().ratedCurrentAmps() != null) {
      Resolved<DeviceCharacteristic> characteristic =
          DeviceCharacteristic.of(
              spec.device(),
              circuit.getDevice() == null ? null : circuit.getDevice().mccbSettings(),
              ProtectionSettings.DEFAULT_MCCB_INSTANTANEOUS_MULTIPLE);
      Double surgeSeconds =
          loads.stream()
              .map(LoadItem::getStartUpSurgeMillis)
              .filter(Objects::nonNull)
              .max(Double::compare)
              .map(millis -> millis / 1000.0)
              .orElse(null);
      Double faultAmps = null;
      if (findings != null
          && findings.loopImpedanceOhms() != null
          && findings.loopImpedanceOhms().isKnown()
          && findings.loopImpedanceOhms().value() > 0) {
        faultAmps =
            results.spec().supply().nominalVoltageToEarthVolts()
                / findings.loopImpedanceOhms().value();
      }
      model.addAttribute(
          "chartBasis",
          characteristic.isKnown()
              ? TimeCurrentBand.of(characteristic.value()).basis()
              : characteristic.missing());
      model.addAttribute(
          "chart",
          TimeCurrentChart.of(
              characteristic.isKnown() ? TimeCurrentBand.of(characteristic.value()) : null,
              spec.device().ratedCurrentAmps(),
              demand != null && demand.isAssessed() ? demand.designCurrentAmps() : null,
              findings == null ? null : findings.startUpSurgeAmps(),
              surgeSeconds,
              faultAmps));
    }
    return "check/circuit";
  }

  @PostMapping("/circuits/{id}/apply-proposal")
  public String applyProposal(
      @PathVariable long id, @RequestParam long version, RedirectAttributes redirect) {
    Circuit circuit = schedule.circuit(id);
    long boardId = circuit.getBoard().getId();
    SiteAnalysis results = analysis.ofBoard(boardId);
    DeviceProposal proposal = proposal(results, id, results.circuitDemands(boardId).get(id));
    if (proposal == null || !proposal.found()) {
      redirect.addFlashAttribute("problem", "proposal.none");
      return "redirect:/circuits/" + id;
    }
    try {
      schedule.replaceDevice(id, version, proposal.device(), proposal.cable());
      redirect.addFlashAttribute("applied", true);
    } catch (RuleViolation violation) {
      redirect.addFlashAttribute("problem", violation.messageCode());
    }
    return "redirect:/circuits/" + id;
  }

  private DeviceProposal proposal(SiteAnalysis results, long circuitId, CircuitDemand demand) {
    return analysis.proposal(results, circuitId, demand);
  }

  private static CircuitSpec specOf(SiteAnalysis results, long circuitId) {
    for (BoardSpec board : results.spec().boards()) {
      for (CircuitSpec circuit : board.circuits()) {
        if (circuit.id() == circuitId) {
          return circuit;
        }
      }
    }
    return null;
  }
}
