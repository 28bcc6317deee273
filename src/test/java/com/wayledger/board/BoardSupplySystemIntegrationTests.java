package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import com.wayledger.support.NecPanels;
import org.hamcrest.Matchers;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;
import org.springframework.test.web.servlet.request.RequestPostProcessor;

/**
 * A board's own supply system through the board form and the API: which systems a board may have
 * follows from its feed, anything else is refused beside the field with nothing saved, and the
 * figures of a 120/208 V panel on two poles of a 208Y/120 V one land on the lines it is fed from.
 * Sites and figures are invented.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class BoardSupplySystemIntegrationTests {

  private static final RequestPostProcessor EDITOR = user("ed").roles("EDITOR");

  @Autowired MockMvc mvc;
  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired BoardRepository boardRepository;
  @Autowired ScheduleService schedule;
  @Autowired AnalysisService analysis;

  Site site;
  Board house;
  Circuit twoPoleWay;
  Circuit threePoleWay;

  @BeforeEach
  void aWyeSiteWithAHousePanel() {
    site = NecPanels.wyeSite(sites, "Invented 208Y building");
    house = boards.create(site.getId(), NecPanels.panelForm("HP", 3, 42));
    // spaces 3 and 5 are lines B and C of a three-phase panelboard
    twoPoleWay =
        schedule.addCircuit(
            house.getId(), NecPanels.feeder(3, PhasePosition.L2_L3, "Feeder to unit panel"));
    threePoleWay =
        schedule.addCircuit(house.getId(), NecPanels.feeder(7, PhasePosition.THREE_POLE, "Feeder"));
  }

  @Test
  void aPanelOnTwoPolesOfThe208YPanelCannotBeA208YPanel() throws Exception {
    long before = boardRepository.count();

    mvc.perform(subPanel("U1", twoPoleWay, "WYE_208Y_120", "1"))
        .andExpect(status().isUnprocessableEntity())
        .andExpect(
            org.springframework.test.web.servlet.result.MockMvcResultMatchers.content()
                .string(Matchers.containsString("can only be on 120/208 V single-phase")));

    assertThat(boardRepository.count()).as("nothing saved").isEqualTo(before);
  }

  @Test
  void aPanelOnAThreePoleWayCannotBeASingle120208Panel() throws Exception {
    long before = boardRepository.count();

    mvc.perform(subPanel("U2", threePoleWay, "SINGLE_PHASE_120_208", "1"))
        .andExpect(status().isUnprocessableEntity());

    assertThat(boardRepository.count()).as("nothing saved").isEqualTo(before);
  }

  @Test
  void aSecondServiceAtAnotherVoltageIsRefusedBesideTheField() throws Exception {
    long before = boardRepository.count();

    mvc.perform(rootPanel("Shop", "WYE_480Y_277", "3"))
        .andExpect(status().isUnprocessableEntity())
        .andExpect(
            org.springframework.test.web.servlet.result.MockMvcResultMatchers.content()
                .string(Matchers.containsString("the site&#39;s voltage to neutral")));

    assertThat(boardRepository.count()).as("nothing saved").isEqualTo(before);
  }

  @Test
  void aSecondServiceAt120To240VoltsIsTakenAndShownOnItsPage() throws Exception {
    mvc.perform(rootPanel("Cottage", "SPLIT_PHASE_120_240", "1"))
        .andExpect(status().is3xxRedirection());

    Board cottage = boardNamed("Cottage");
    assertThat(cottage.getSupplySystem()).isEqualTo(SupplySystem.SPLIT_PHASE_120_240);
    assertThat(cottage.lineCount()).isEqualTo(2);
    mvc.perform(get("/boards/{id}", cottage.getId()).with(EDITOR))
        .andExpect(status().isOk())
        .andExpect(
            org.springframework.test.web.servlet.result.MockMvcResultMatchers.content()
                .string(Matchers.containsString("120/240 V single-phase three-wire")));
  }

  @Test
  void theBoardFormOffersTheSitesSystemAndTheRuleSetsOwn() throws Exception {
    mvc.perform(get("/sites/{id}/boards/new", site.getId()).with(EDITOR))
        .andExpect(status().isOk())
        .andExpect(
            org.springframework.test.web.servlet.result.MockMvcResultMatchers.content()
                .string(
                    Matchers.allOf(
                        Matchers.containsString("The site&#39;s (208Y/120 V"),
                        Matchers.containsString("value=\"SINGLE_PHASE_120_208\""))));
  }

  @Test
  void aUnitPanelOnLinesBAndCLoadsBAndCOfTheHousePanel() throws Exception {
    mvc.perform(subPanel("U3", twoPoleWay, "SINGLE_PHASE_120_208", "1"))
        .andExpect(status().is3xxRedirection());
    Board unit = boardNamed("U3");
    // 1200 W at 120 V on the unit's A (10 A), 2400 W on its B (20 A)
    schedule.addCircuit(unit.getId(), NecPanels.breaker(1, PhasePosition.L1, "Lights", 1200));
    schedule.addCircuit(unit.getId(), NecPanels.breaker(4, PhasePosition.L2, "Heater", 2400));

    BoardDemand parent = analysis.ofSite(site.getId()).demand().board(house.getId());

    // the unit's A is the house panel's B, its B the house panel's C (the way's lines in order)
    assertThat(parent.onPhase(Phase.L1).currentAmps()).as("A").isCloseTo(0.0, offset());
    assertThat(parent.onPhase(Phase.L2).currentAmps()).as("B: 1200/120").isCloseTo(10.0, offset());
    assertThat(parent.onPhase(Phase.L3).currentAmps()).as("C: 2400/120").isCloseTo(20.0, offset());
    // |10∠−120° + 20∠120°| = √(100 + 400 − 200) = √300 (textbook phasor sum)
    assertThat(parent.neutralCurrentAmps()).isCloseTo(Math.sqrt(300.0), offset());
  }

  @Test
  void aFeederOfA120208PanelCannotBecomeThreePoleAndNothingIsSaved() throws Exception {
    mvc.perform(subPanel("U5", twoPoleWay, "SINGLE_PHASE_120_208", "1"))
        .andExpect(status().is3xxRedirection());
    long version = twoPoleWay.getVersion();

    // three poles of a 208Y/120 V panel give 208Y/120 V, not the 120/208 V the unit panel is on
    assertThatThrownBy(
            () ->
                schedule.updateCircuit(
                    twoPoleWay.getId(),
                    NecPanels.feeder(13, PhasePosition.THREE_POLE, "Feeder to unit panel")))
        .isInstanceOfSatisfying(
            com.wayledger.system.RuleViolation.class,
            refused -> {
              assertThat(refused.field()).isEqualTo("position");
              assertThat(refused.messageCode()).isEqualTo("circuit.position.feedsOtherSystem");
            });

    Circuit stored = schedule.circuit(twoPoleWay.getId());
    assertThat(stored.getPosition()).as("nothing saved").isEqualTo(PhasePosition.L2_L3);
    assertThat(stored.getWayNumber()).isEqualTo(3);
    assertThat(stored.getVersion()).isEqualTo(version);
  }

  @Test
  void aFeederOfA120208PanelMayMoveToAnotherPairOfLines() throws Exception {
    mvc.perform(subPanel("U6", twoPoleWay, "SINGLE_PHASE_120_208", "1"))
        .andExpect(status().is3xxRedirection());
    Board unit = boardNamed("U6");

    // space 13 starts rows 7 and 8: A then B on a three-line panel (common practice); still two
    // poles, so still a 120/208 V feed
    schedule.updateCircuit(
        twoPoleWay.getId(), NecPanels.feeder(13, PhasePosition.L1_L2, "Feeder to unit panel"));

    assertThat(schedule.circuit(twoPoleWay.getId()).getPosition().isLineToLine()).isTrue();
    assertThat(boardRepository.findById(unit.getId()).orElseThrow().system())
        .isEqualTo(SupplySystem.SINGLE_PHASE_120_208);
  }

  @Test
  void aPanelWithBreakersOnLineCCannotBecomeA120208Panel() throws Exception {
    Board before = boardRepository.findById(house.getId()).orElseThrow();

    mvc.perform(
            post("/boards/{id}", house.getId())
                .with(EDITOR)
                .with(csrf())
                .param("reference", "HP")
                .param("phases", "1")
                .param("wayCount", "42")
                .param("incomerKind", "MCCB")
                .param("incomerRatingAmps", "200")
                .param("incomerPoles", "2")
                .param("unbalanceLimitPercent", "10")
                .param("coincidenceFactor", "1")
                .param("version", String.valueOf(before.getVersion()))
                .param("supplySystem", "SINGLE_PHASE_120_208"))
        .andExpect(status().isUnprocessableEntity())
        .andExpect(
            org.springframework.test.web.servlet.result.MockMvcResultMatchers.content()
                .string(Matchers.containsString("lines the new supply system does not have")));

    Board after = boardRepository.findById(house.getId()).orElseThrow();
    assertThat(after.getSupplySystem()).as("nothing saved").isNull();
    assertThat(after.getVersion()).isEqualTo(before.getVersion());
  }

  @Test
  void theApiTakesAndShowsTheBoardsOwnSystem() throws Exception {
    String body =
        """
        {"reference": "API unit", "phases": 1, "wayCount": 24, "incomerKind": "MCCB",
         "incomerRatingAmps": 100, "incomerPoles": 2, "parentBoardId": %d,
         "fedFromCircuitId": %d, "unbalanceLimitPercent": 10, "coincidenceFactor": 1,
         "supplySystem": "%s"}
        """;
    mvc.perform(
            post("/api/sites/{id}/boards", site.getId())
                .with(EDITOR)
                .with(csrf())
                .contentType(MediaType.APPLICATION_JSON)
                .content(body.formatted(house.getId(), twoPoleWay.getId(), "WYE_208Y_120")))
        .andExpect(status().isUnprocessableEntity())
        .andExpect(jsonPath("$.fields[*].field", Matchers.hasItem("supplySystem")));
    mvc.perform(
            post("/api/sites/{id}/boards", site.getId())
                .with(EDITOR)
                .with(csrf())
                .contentType(MediaType.APPLICATION_JSON)
                .content(body.formatted(house.getId(), twoPoleWay.getId(), "SINGLE_PHASE_120_208")))
        .andExpect(status().is2xxSuccessful())
        .andExpect(jsonPath("$.supplySystem").value("SINGLE_PHASE_120_208"));
  }

  private Board boardNamed(String reference) {
    return boards.onSite(site.getId()).stream()
        .filter(b -> b.getReference().equals(reference))
        .findFirst()
        .orElseThrow();
  }

  private MockHttpServletRequestBuilder rootPanel(String reference, String system, String phases) {
    return panel(reference, system, phases);
  }

  private MockHttpServletRequestBuilder subPanel(
      String reference, Circuit feed, String system, String phases) {
    return panel(reference, system, phases)
        .param("parentBoardId", String.valueOf(house.getId()))
        .param("fedFromCircuitId", String.valueOf(feed.getId()));
  }

  private MockHttpServletRequestBuilder panel(String reference, String system, String phases) {
    return post("/sites/{id}/boards", site.getId())
        .with(EDITOR)
        .with(csrf())
        .param("reference", reference)
        .param("phases", phases)
        .param("wayCount", "24")
        .param("incomerKind", "MCCB")
        .param("incomerRatingAmps", "100")
        .param("incomerPoles", "2")
        .param("unbalanceLimitPercent", "10")
        .param("coincidenceFactor", "1")
        .param("supplySystem", system);
  }

  private static org.assertj.core.data.Offset<Double> offset() {
    return org.assertj.core.data.Offset.offset(1e-6);
  }
}
