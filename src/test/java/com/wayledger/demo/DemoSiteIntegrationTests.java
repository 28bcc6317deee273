package com.wayledger.demo;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.board.AnalysisService;
import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.board.SiteAnalysis;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.protection.CircuitLoading;
import com.wayledger.engine.protection.DeviceProposal;
import com.wayledger.engine.protection.DeviceProposer;
import com.wayledger.engine.protection.ProtectionSettings;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.test.context.ActiveProfiles;

/**
 * The demo site is invented so that later features have something to find: these tests hold it to
 * that promise (each deliberately wrong circuit shows the right finding) and keep its figures
 * plausible.
 */
@SpringBootTest
@ActiveProfiles({"test", "demo"})
class DemoSiteIntegrationTests {

  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired AnalysisService analysis;

  Site site;
  SiteAnalysis results;

  @BeforeEach
  void analyseDemoSite() {
    site =
        sites.all().stream()
            .filter(s -> s.getName().equals(DemoSite.SITE_NAME))
            .findFirst()
            .orElseThrow();
    results = analysis.ofSite(site.getId());
  }

  @Test
  void demoSiteHasAboutSixtyCircuitsOnFiveBoards() {
    List<Board> onSite = boards.onSite(site.getId());
    int circuits =
        results.spec().boards().stream().mapToInt(board -> board.circuits().size()).sum();
    assertThat(onSite)
        .extracting(Board::getReference)
        .containsExactlyInAnyOrder("MDB", "KB1", "FLAT-1", "FLAT-2", "LL");
    assertThat(circuits).as("circuits on the demo site").isBetween(50, 70);
  }

  @Test
  void everyBoardHasADemandWithinItsConnectedLoad() {
    for (BoardDemand board : results.demand().boards()) {
      assertThat(board.demandWatts()).as(board.reference() + " demand").isPositive();
      assertThat(board.demandWatts())
          .as(board.reference() + " demand never exceeds connected load (sub-boards included)")
          .isLessThanOrEqualTo(board.connectedWatts() + subBoardWatts(board) + 1e-6);
    }
  }

  @Test
  void lopsidedBakeryBoardIsFlaggedAsUnbalanced() {
    BoardDemand bakery = board("KB1");
    assertThat(bakery.isUnbalancedBeyondLimit())
        .as("KB1 unbalance %s %%", bakery.unbalancePercent())
        .isTrue();
    assertThat(findings("KB1", null))
        .anyMatch(f -> f.check() == CheckKind.PHASE_UNBALANCE && isProblem(f));
  }

  @Test
  void flatTwoShowerOnA32AmpBreakerIsAnOverloadedWay() {
    assertThat(findings("FLAT-2", "Shower"))
        .anyMatch(f -> f.check() == CheckKind.WAY_OVERLOAD && isProblem(f));
  }

  @Test
  void flatOneKitchenRadialInInsulationIsACableNotProtected() {
    assertThat(findings("FLAT-1", "Sockets radial, kitchen"))
        .anyMatch(f -> f.check() == CheckKind.CABLE_PROTECTION && f.verdict() == Verdict.DANGER);
    assertThat(findings("FLAT-2", "Sockets radial, kitchen"))
        .as("the same circuit in 4 mm² clipped direct is fine")
        .noneMatch(f -> f.check() == CheckKind.CABLE_PROTECTION && isProblem(f));
  }

  @Test
  void flatSocketRingsAreJudgedAsRingsAndPass() {
    for (String flat : List.of("FLAT-1", "FLAT-2")) {
      assertThat(circuit(flat, "Sockets ring, living and bedrooms").ringFinal())
          .as(flat + " ring flagged")
          .isTrue();
      List<Finding> ring = findings(flat, "Sockets ring, living and bedrooms");
      // BS 7671 433.1.204 (from memory): 2.5/1.5 mm², In 32 A ≤ 32 A, Iz 27 A ≥ 20 A
      assertThat(ring)
          .as(flat)
          .anyMatch(
              f ->
                  f.check() == CheckKind.CABLE_PROTECTION
                      && f.verdict() == Verdict.PASS
                      && f.summary().contains("ring final circuit"));
      assertThat(ring)
          .as(flat + " loop impedance and drop")
          .anyMatch(
              f ->
                  f.check() == CheckKind.LOOP_IMPEDANCE
                      && f.verdict() == Verdict.PASS
                      && f.summary().contains("ring final circuit"));
      assertThat(ring).as(flat + ": no problem on the ring: %s", ring).noneMatch(this::isProblem);
    }
  }

  @Test
  void cleanersSocketWithoutRcdIsFound() {
    assertThat(findings("LL", "Cleaner's socket, stair cupboard"))
        .anyMatch(f -> f.check() == CheckKind.SOCKET_RCD && isProblem(f));
  }

  @Test
  void mixerTripsItsTypeBBreakerOnStartUpAndTheProposalPassesEveryCheck() {
    CircuitSpec mixer = circuit("KB1", "Spiral dough mixer");
    long bakeryId = board("KB1").boardId();
    assertThat(findings("KB1", "Spiral dough mixer"))
        .anyMatch(f -> f.check() == CheckKind.START_UP_SURGE && isProblem(f));
    double designCurrent = results.circuitDemands(bakeryId).get(mixer.id()).designCurrentAmps();
    DeviceProposal proposal =
        DeviceProposer.propose(
            results.spec(),
            mixer.id(),
            new CircuitLoading(mixer.id(), designCurrent),
            ProtectionSettings.DEFAULTS);
    assertThat(proposal.found()).as("a device is proposed: %s", proposal.reasons()).isTrue();
    assertThat(proposal.checks()).allMatch(check -> check.verdict() == Verdict.PASS);
    assertThat(proposal.device().curve())
        .as("a curve whose band sits above the surge")
        .isNotEqualTo(mixer.device().curve());
  }

  private boolean isProblem(Finding finding) {
    return finding.verdict() == Verdict.DANGER || finding.verdict() == Verdict.WARNING;
  }

  private double subBoardWatts(BoardDemand board) {
    return board.circuits().stream()
        .filter(c -> c.feedsBoardId() != null)
        .mapToDouble(c -> c.demandWatts())
        .sum();
  }

  private BoardDemand board(String reference) {
    return results.demand().boards().stream()
        .filter(b -> b.reference().equals(reference))
        .findFirst()
        .orElseThrow();
  }

  private CircuitSpec circuit(String boardReference, String description) {
    return results.spec().boards().stream()
        .filter(b -> b.reference().equals(boardReference))
        .flatMap(b -> b.circuits().stream())
        .filter(c -> c.description().equals(description))
        .findFirst()
        .orElseThrow();
  }

  /** Findings of a board (circuit null) or of one of its circuits. */
  private List<Finding> findings(String boardReference, String circuitDescription) {
    long boardId = board(boardReference).boardId();
    var boardFindings = results.boardFindings(boardId).orElseThrow();
    if (circuitDescription == null) {
      return boardFindings.findings();
    }
    long circuitId =
        results.demand().board(boardId).circuits().stream()
            .filter(c -> c.description().equals(circuitDescription))
            .findFirst()
            .orElseThrow()
            .circuitId();
    return results.circuitFindings(boardId).get(circuitId).findings();
  }
}
