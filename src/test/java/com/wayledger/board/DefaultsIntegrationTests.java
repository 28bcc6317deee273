package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import com.wayledger.site.Site;
import com.wayledger.site.SiteForm;
import com.wayledger.site.SiteService;
import java.util.List;
import java.util.UUID;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

/**
 * Defaults as data: a site's and a board's cable conditions and start-up multiples, inherited by
 * circuits that record none, named beside the findings that used them; and a board fed from the
 * origin that needs no submain. Figures are invented test data; the checks' own values are tested
 * in the engine against their sources.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class DefaultsIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired SiteService sites;
  @Autowired AnalysisService analysis;
  @Autowired ScheduleService schedule;
  @Autowired BoardRepository boardRepository;
  @Autowired JdbcClient jdbc;

  Site site;
  long boardId;

  @BeforeEach
  void siteWithSupplyAndABoardFromTheOriginAsTheNewBoardFormSendsIt() throws Exception {
    site =
        sites.create(
            new SiteForm(
                "Defaults " + UUID.randomUUID(),
                null,
                EarthingSystem.TN_C_S,
                230.0,
                3,
                50.0,
                0.35,
                6.0,
                100.0,
                null,
                null,
                null,
                null));
    // the board form as a browser sent it before: submain material and insulation preselected,
    // no submain size or length
    mvc.perform(
            post("/sites/{id}/boards", site.getId())
                .with(user("ed").roles("EDITOR"))
                .with(csrf())
                .param("reference", "DB-D")
                .param("phases", "3")
                .param("wayCount", "12")
                .param("incomerKind", "MCCB")
                .param("incomerRatingAmps", "100")
                .param("incomerPoles", "3")
                .param("incomerBreakingCapacityKiloAmps", "10")
                .param("submainMaterial", "COPPER")
                .param("submainInsulation", "THERMOPLASTIC_70")
                .param("unbalanceLimitPercent", "10")
                .param("coincidenceFactor", "1"))
        .andExpect(status().is3xxRedirection());
    boardId =
        jdbc.sql("SELECT id FROM board WHERE site_id = ?")
            .param(site.getId())
            .query(Long.class)
            .single();
  }

  @Test
  void withTheSiteDefaultsFilledInANewCircuitIsFullyAssessedOnFirstSave() throws Exception {
    mvc.perform(siteDefaults("C", "30", "1", "0", "8")).andExpect(status().is3xxRedirection());

    long circuitId = addMotorCircuit(null);

    List<Finding> findings = findingsOf(circuitId);
    assertThat(findings).as("findings of the new circuit").isNotEmpty();
    assertThat(findings)
        .as("no check of the new circuit lacks an input: " + findings)
        .noneMatch(finding -> finding.verdict() == Verdict.NOT_ASSESSED);
  }

  @Test
  void withoutDefaultsTheSameCircuitSaysWhatIsMissing() throws Exception {
    long circuitId = addMotorCircuit(null);

    assertThat(findingsOf(circuitId))
        .as("cable check without installation method, from no default")
        .anySatisfy(
            finding -> {
              assertThat(finding.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
              assertThat(finding.summary()).contains("installation method");
            });
  }

  @Test
  void aBoardFedFromTheOriginNeedsNoSubmain() throws Exception {
    mvc.perform(siteDefaults("C", "30", "1", "0", "8")).andExpect(status().is3xxRedirection());
    long circuitId = addMotorCircuit(null);

    assertThat(boardRepository.findById(boardId).orElseThrow().getSubmain().isRecorded())
        .as("a preset material alone is not a submain")
        .isFalse();
    assertThat(findingsOf(circuitId))
        .as("no finding waits for a submain")
        .noneMatch(finding -> finding.summary().contains("submain"));
  }

  @Test
  void aBoardDefaultWinsOverTheSitesAndTheFindingsSaySo() throws Exception {
    mvc.perform(siteDefaults("C", "30", "1", "0", "8")).andExpect(status().is3xxRedirection());
    mvc.perform(
            post("/boards/{id}/defaults", boardId)
                .with(user("ed").roles("EDITOR"))
                .with(csrf())
                .param("ambientCelsius", "40")
                .param("location", "OUTDOORS"))
        .andExpect(status().is3xxRedirection());
    long circuitId = addMotorCircuit(null);

    assertThat(schedule.inheritedBy(circuitId))
        .as("what the circuit inherits, and from where")
        .contains(
            new Inheritance.InheritedValue(
                "cableAmbientCelsius", 40.0, Inheritance.Source.BOARD, null),
            new Inheritance.InheritedValue(
                "cableInstallationMethod",
                com.wayledger.engine.InstallationMethod.C,
                Inheritance.Source.SITE,
                null),
            new Inheritance.InheritedValue(
                "loadStartUpMultiple",
                8.0,
                Inheritance.Source.SITE,
                com.wayledger.engine.LoadCategory.MOTOR),
            new Inheritance.InheritedValue(
                "location",
                com.wayledger.engine.CircuitLocation.OUTDOORS,
                Inheritance.Source.BOARD,
                null));

    String checks =
        mvc.perform(get("/circuits/{id}", circuitId).with(user("ed").roles("EDITOR")))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(checks)
        .as("the cable check names the inherited values")
        .contains("ambient 40 °C (board default)")
        .contains("method C clipped direct (site default)")
        .contains("not grouped (site default)")
        .contains("start-up 8 × for Motor (site default)")
        .contains("Outdoors, or equipment used outdoors (board default)");
    assertThat(findingsOf(circuitId))
        .as("outdoors, from the board's default, brings in the 30 mA rule for outdoor equipment")
        .anySatisfy(
            finding -> {
              assertThat(finding.check())
                  .isEqualTo(com.wayledger.engine.protection.result.CheckKind.SOCKET_RCD);
              assertThat(finding.verdict()).isNotEqualTo(Verdict.NOT_ASSESSED);
            });
  }

  @Test
  void theBoardsFindingsListNotesTheInheritedValueBesideTheCircuitsLine() throws Exception {
    mvc.perform(
            post("/boards/{id}/defaults", boardId)
                .with(user("ed").roles("EDITOR"))
                .with(csrf())
                .param("location", "OUTDOORS"))
        .andExpect(status().is3xxRedirection());
    long circuitId = addMotorCircuit(null);
    assertThat(findingsOf(circuitId))
        .as("an MCB without 30 mA protection feeding outdoor equipment is a problem")
        .anySatisfy(
            finding -> {
              assertThat(finding.check())
                  .isEqualTo(com.wayledger.engine.protection.result.CheckKind.SOCKET_RCD);
              assertThat(finding.verdict().isProblem()).isTrue();
            });

    String page =
        mvc.perform(get("/boards/{id}", boardId).with(user("ed").roles("EDITOR")))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(page)
        .as("the circuit's line in the board's findings says which default it used")
        .contains("id=\"findings-c" + circuitId + "\"")
        .contains(
            "<small class=\"inherited\"><span>Used:</span>\n"
                + "  <span>Outdoors, or equipment used outdoors (board default)</span></small>");
  }

  @Test
  void aCircuitsOwnValueWinsOverEveryDefault() throws Exception {
    mvc.perform(siteDefaults("C", "30", "1", "0", "8")).andExpect(status().is3xxRedirection());
    long circuitId = addMotorCircuit("25");

    assertThat(schedule.inheritedBy(circuitId))
        .as("the circuit records its own ambient")
        .noneMatch(value -> value.field().equals("cableAmbientCelsius"));
  }

  @Test
  void anImpossibleDefaultIsRefusedBesideItsFieldAndNothingIsStored() throws Exception {
    String page =
        mvc.perform(siteDefaults("C", "200", "1", "0", "8"))
            .andExpect(status().is(422))
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(page).as("message beside the ambient field").contains("has-error");
    assertThat(sites.get(site.getId()).getDefaults().getInstallationMethod())
        .as("nothing half-saved")
        .isNull();
  }

  @Test
  void savingTheSameDefaultsTwiceRecordsOneChange() throws Exception {
    mvc.perform(siteDefaults("C", "30", "1", "0", "8")).andExpect(status().is3xxRedirection());
    long entries = logEntries();
    mvc.perform(siteDefaults("C", "30", "1", "0", "8")).andExpect(status().is3xxRedirection());
    assertThat(logEntries()).as("change-log entries after an unchanged save").isEqualTo(entries);
  }

  @Test
  void theLogSaysWhichDefaultsChangedFromWhatToWhat() throws Exception {
    mvc.perform(siteDefaults("C", "30", "1", "0", "8")).andExpect(status().is3xxRedirection());
    mvc.perform(siteDefaults("C", "35", "1", "0", "8")).andExpect(status().is3xxRedirection());
    String latest =
        jdbc.sql("SELECT summary FROM change_log WHERE site_id = ? ORDER BY id DESC")
            .param(site.getId())
            .query(String.class)
            .list()
            .get(0);
    assertThat(latest)
        .as("the newest log line names the changed default, old and new value")
        .contains("defaults changed: Ambient temperature (°C) 30 → 35")
        .doesNotContain("Installation method");
  }

  @Test
  void commonPracticeFillsEmptyFieldsAndMarksThem() throws Exception {
    String page =
        mvc.perform(
                get("/sites/{id}/defaults", site.getId())
                    .param("commonPractice", "true")
                    .with(user("ed").roles("EDITOR")))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(page)
        .as("ambient filled with the usual 30 °C and marked common practice")
        .containsPattern("name=\"ambientCelsius\" value=\"30.0\"")
        .contains("common practice");
    assertThat(sites.get(site.getId()).getDefaults().getAmbientCelsius())
        .as("nothing stored before Save")
        .isNull();
  }

  @Test
  void theEditorMarksEveryMissingInputAtOnceAndDefaultsCountAsGiven() throws Exception {
    long circuitId = addMotorCircuit(null);

    String editor = editorOf(circuitId);
    for (String field :
        List.of(
            "cableInstallationMethod",
            "cableAmbientCelsius",
            "cableGroupedCircuits",
            "cableThermalInsulationMm",
            "location")) {
      String fieldBlock =
          java.util.Arrays.stream(editor.split("<div class=\"field"))
              .filter(block -> block.contains("name=\"" + field + "\""))
              .findFirst()
              .orElseThrow();
      assertThat(fieldBlock)
          .as("the editor marks " + field + " as needed, in the same answer as the others")
          .contains("needed for the checks");
    }
    assertThat(schedulePage())
        .as("the schedule row lists all five at once")
        .contains("Still needed for full checks (5 inputs)")
        .contains("installation method,")
        .contains("thermal insulation")
        .contains("where its equipment is");

    mvc.perform(siteDefaults("C", "30", "1", "0", "8")).andExpect(status().is3xxRedirection());
    assertThat(editorOf(circuitId))
        .as("with the site's defaults nothing is missing any more")
        .doesNotContain("needed for the checks");
    assertThat(schedulePage()).doesNotContain("Still needed");
  }

  @Test
  void theFirstLoadTakesItsStartUpMultipleFromTheCircuitForm() throws Exception {
    mvc.perform(
            post("/boards/{id}/circuits", boardId)
                .with(user("ed").roles("EDITOR"))
                .with(csrf())
                .param("wayNumber", "2")
                .param("position", "L2")
                .param("description", "Extract fan")
                .param("status", "IN_USE")
                .param("deviceKind", "MCB")
                .param("deviceCurve", "C")
                .param("deviceRatingAmps", "10")
                .param("loadCategory", "MOTOR")
                .param("loadQuantity", "1")
                .param("loadRatingValue", "750")
                .param("loadRatingUnit", "W")
                .param("loadPowerFactor", "0.8")
                .param("loadStartUpMultiple", "7"))
        .andExpect(status().is3xxRedirection());
    Double stored =
        jdbc.sql(
                "SELECT l.surge_multiple FROM load_item l JOIN circuit c ON c.id = l.circuit_id"
                    + " WHERE c.board_id = ? AND c.way_number = 2")
            .param(boardId)
            .query(Double.class)
            .single();
    assertThat(stored).as("start-up multiple of the first load").isEqualTo(7.0);
  }

  private String editorOf(long circuitId) throws Exception {
    return mvc.perform(
            get("/circuits/{id}/edit", circuitId)
                .header("HX-Request", "true")
                .with(user("ed").roles("EDITOR")))
        .andExpect(status().isOk())
        .andReturn()
        .getResponse()
        .getContentAsString();
  }

  private String schedulePage() throws Exception {
    return mvc.perform(get("/boards/{id}", boardId).with(user("ed").roles("EDITOR")))
        .andExpect(status().isOk())
        .andReturn()
        .getResponse()
        .getContentAsString();
  }

  private long logEntries() {
    return jdbc.sql("SELECT COUNT(*) FROM change_log WHERE site_id = ?")
        .param(site.getId())
        .query(Long.class)
        .single();
  }

  private MockHttpServletRequestBuilder siteDefaults(
      String method, String ambient, String grouped, String insulationMm, String motorMultiple) {
    return post("/sites/{id}/defaults", site.getId())
        .with(user("ed").roles("EDITOR"))
        .with(csrf())
        .param("installationMethod", method)
        .param("ambientCelsius", ambient)
        .param("groupedCircuits", grouped)
        .param("thermalInsulationMm", insulationMm)
        .param("material", "COPPER")
        .param("insulation", "THERMOPLASTIC_70")
        .param("location", "INDOORS")
        .param("motorStartUpMultiple", motorMultiple);
  }

  /**
   * Device, cable size, length and one load: what a contractor types for a new circuit. Where its
   * equipment is comes from the site's default when the test sets one.
   */
  private long addMotorCircuit(String ambient) throws Exception {
    var request =
        post("/boards/{id}/circuits", boardId)
            .with(user("ed").roles("EDITOR"))
            .with(csrf())
            .param("wayNumber", "1")
            .param("position", "L1")
            .param("description", "Dough mixer")
            .param("status", "IN_USE")
            .param("deviceKind", "MCB")
            .param("deviceCurve", "C")
            .param("deviceRatingAmps", "16")
            .param("deviceBreakingCapacityKiloAmps", "6")
            .param("cableLineCsa", "2.5")
            .param("cableCpcCsa", "1.5")
            .param("cableLengthMetres", "20")
            .param("loadDescription", "Mixer motor")
            .param("loadCategory", "MOTOR")
            .param("loadQuantity", "1")
            .param("loadRatingValue", "1500")
            .param("loadRatingUnit", "W")
            .param("loadPowerFactor", "0.85");
    if (ambient != null) {
      request = request.param("cableAmbientCelsius", ambient);
    }
    mvc.perform(request).andExpect(status().is3xxRedirection());
    return jdbc.sql("SELECT id FROM circuit WHERE board_id = ? AND way_number = 1")
        .param(boardId)
        .query(Long.class)
        .single();
  }

  private List<Finding> findingsOf(long circuitId) {
    return analysis.ofSite(site.getId()).circuitFindings(boardId).get(circuitId).findings();
  }
}
