package com.wayledger.check;

import com.wayledger.board.AnalysisApiController;
import com.wayledger.board.AnalysisService;
import com.wayledger.board.Circuit;
import com.wayledger.board.ScheduleService;
import com.wayledger.board.SiteAnalysis;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.protection.DeviceProposal;
import com.wayledger.engine.protection.result.Finding;
import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import java.util.List;
import org.springframework.http.HttpStatus;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;

/**
 * A circuit's device proposal over the API: the same proposal the circuit page shows, and applying
 * it with the same optimistic lock (the circuit's version).
 */
@RestController
@RequestMapping("/api")
@Tag(name = "Device proposal", description = "The lowest device that passes every check at once")
public class CircuitProposalApiController {

  private final ScheduleService schedule;
  private final AnalysisService analysis;

  public CircuitProposalApiController(ScheduleService schedule, AnalysisService analysis) {
    this.schedule = schedule;
    this.analysis = analysis;
  }

  /**
   * One check the proposed device passes.
   *
   * @param check the check's name
   * @param verdict its verdict with the proposed device
   * @param summary the finding's sentence
   * @param reference the clause
   */
  public record CheckPassed(String check, String verdict, String summary, String reference) {}

  /**
   * The proposal for a circuit.
   *
   * @param circuitId the circuit
   * @param version the circuit's version, to send back when applying
   * @param found whether a device passes every check
   * @param device the proposed device; null when none
   * @param checks the checks it passes, with their figures in words
   * @param reasons why no device passes, or what each rejected choice failed; "missing …" names the
   *     input the proposal needs
   * @param caution the caution that travels with every computed result
   */
  public record ProposalView(
      long circuitId,
      long version,
      boolean found,
      DeviceSpec device,
      List<CheckPassed> checks,
      List<String> reasons,
      String caution,
      ProposedConductor conductor) {

    public ProposalView(
        long circuitId,
        long version,
        boolean found,
        DeviceSpec device,
        List<CheckPassed> checks,
        List<String> reasons,
        String caution) {
      this(circuitId, version, found, device, checks, reasons, caution, null);
    }
  }

  /**
   * The conductor proposed with the device (NEC set: an AWG or kcmil size); absent when the
   * recorded cable is kept.
   */
  public record ProposedConductor(String size, double squareMillimetres, String material) {}

  @GetMapping("/circuits/{id}/proposal")
  @Operation(summary = "The device proposed for a circuit, the checks it passes, or why none does")
  public ProposalView proposal(@PathVariable long id) {
    Circuit circuit = schedule.circuit(id);
    return view(circuit, proposalOf(circuit));
  }

  @PostMapping("/circuits/{id}/proposal")
  @Operation(
      summary =
          "Fit the proposed device; refused with 409 when the circuit changed since version, 422"
              + " when no device is proposed")
  public ResponseEntity<ProposalView> apply(@PathVariable long id, @RequestParam long version) {
    Circuit circuit = schedule.circuit(id);
    DeviceProposal proposal = proposalOf(circuit);
    if (proposal == null || !proposal.found()) {
      return ResponseEntity.status(HttpStatus.UNPROCESSABLE_CONTENT).body(view(circuit, proposal));
    }
    schedule.replaceDevice(id, version, proposal.device(), proposal.cable());
    Circuit fitted = schedule.circuit(id);
    return ResponseEntity.ok(view(fitted, proposalOf(fitted)));
  }

  private DeviceProposal proposalOf(Circuit circuit) {
    long boardId = circuit.getBoard().getId();
    SiteAnalysis results = analysis.ofBoard(boardId);
    return analysis.proposal(
        results, circuit.getId(), results.circuitDemands(boardId).get(circuit.getId()));
  }

  private static ProposalView view(Circuit circuit, DeviceProposal proposal) {
    if (proposal == null) {
      return new ProposalView(
          circuit.getId(),
          circuit.getVersion(),
          false,
          null,
          List.of(),
          List.of("missing protective device: a proposal replaces a recorded device"),
          AnalysisApiController.CAUTION);
    }
    return new ProposalView(
        circuit.getId(),
        circuit.getVersion(),
        proposal.found(),
        proposal.device(),
        proposal.checks().stream().map(CircuitProposalApiController::passed).toList(),
        proposal.reasons(),
        AnalysisApiController.CAUTION,
        conductorOf(proposal));
  }

  private static ProposedConductor conductorOf(DeviceProposal proposal) {
    if (proposal.cable() == null || proposal.cable().lineCsaSquareMillimetres() == null) {
      return null;
    }
    double mm2 = proposal.cable().lineCsaSquareMillimetres();
    return new ProposedConductor(
        com.wayledger.engine.nec.ConductorSize.ofSquareMillimetres(mm2)
            .map(com.wayledger.engine.nec.ConductorSize::label)
            .orElse(null),
        mm2,
        proposal.cable().material() == null ? null : proposal.cable().material().name());
  }

  private static CheckPassed passed(Finding f) {
    return new CheckPassed(f.check().name(), f.verdict().name(), f.summary(), f.reference());
  }
}
