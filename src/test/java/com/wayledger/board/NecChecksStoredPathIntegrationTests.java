package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.engine.nec.ConductorSize;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import java.util.ArrayList;
import java.util.List;
import java.util.UUID;
import org.hamcrest.Matchers;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

/**
 * The NEC checks of issue 14 item 4 on an invented 120/240 V dwelling panel entered through the API
 * and the pages' forms: GFCI by location, interrupting rating, a motor without and then with its
 * horsepower, a location of the other rule set refused beside its field, and the findings on the
 * board page and in the workbook. Names and figures are invented demo data.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class NecChecksStoredPathIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired AnalysisService analysis;
  @Autowired JdbcClient jdbc;

  private MockHttpServletRequestBuilder editor(MockHttpServletRequestBuilder request) {
    return request.with(user("ed").roles("EDITOR")).with(csrf());
  }

  /** An NEC 120/240 V site with 22 kA available at the service (invented). */
  private long site() throws Exception {
    String name = "Invented cottage " + UUID.randomUUID();
    mvc.perform(
            editor(post("/api/sites"))
                .contentType(MediaType.APPLICATION_JSON)
                .content(
                    """
                    {"name": "%s", "earthingSystem": "TN_C_S", "nominalVoltageVolts": 120,
                     "phases": 1, "frequencyHertz": 60, "prospectiveFaultCurrentKiloAmps": 22,
                     "ruleSet": "NEC", "supplySystem": "SPLIT_PHASE_120_240"}
                    """
                        .formatted(name)))
        .andExpect(status().isCreated());
    return jdbc.sql("SELECT id FROM site WHERE name = ?").param(name).query(Long.class).single();
  }

  private long board(long siteId) throws Exception {
    long board = panel(siteId, "LP-1");
    mvc.perform(
            editor(post("/boards/{id}/dwelling", board))
                .param("floorArea", "1200")
                .param("areaUnit", "FT2")
                .param("smallApplianceCircuits", "2")
                .param("laundryCircuits", "1")
                .param("optionalMethod", "false")
                .param("addition", "NONE"))
        .andExpect(status().is3xxRedirection());
    return board;
  }

  /** A panelboard with no dwelling data: not a dwelling unit's. */
  private long panel(long siteId, String reference) throws Exception {
    mvc.perform(
            editor(post("/sites/{id}/boards", siteId))
                .param("reference", reference)
                .param("phases", "1")
                .param("wayCount", "30")
                .param("incomerKind", "MCCB")
                .param("incomerRatingAmps", "200")
                .param("incomerPoles", "2")
                .param("incomerBreakingCapacityKiloAmps", "22")
                .param("unbalanceLimitPercent", "20")
                .param("coincidenceFactor", "1"))
        .andExpect(status().is3xxRedirection());
    return jdbc.sql("SELECT id FROM board WHERE site_id = ? AND reference = ?")
        .param(siteId)
        .param(reference)
        .query(Long.class)
        .single();
  }

  private MockHttpServletRequestBuilder circuit(
      long boardId,
      int way,
      String position,
      String description,
      String location,
      double amps,
      int poles,
      ConductorSize size,
      String category,
      double watts) {
    return editor(post("/boards/{id}/circuits", boardId))
        .param("wayNumber", Integer.toString(way))
        .param("position", position)
        .param("description", description)
        .param("status", "IN_USE")
        .param("location", location)
        .param("deviceKind", "MCCB")
        .param("deviceRatingAmps", Double.toString(amps))
        .param("devicePoles", Integer.toString(poles))
        .param("deviceBreakingCapacityKiloAmps", "10")
        .param("cableLineSize", size.label())
        .param("cableMaterial", "COPPER")
        .param("cableInsulation", "THERMOSETTING_90")
        .param("cableLengthFeet", "40") // an NEC site takes sizes and lengths in AWG and feet
        .param("cableAmbientCelsius", "30")
        .param("cableGroupedCircuits", "1")
        .param("loadDescription", description)
        .param("loadCategory", category)
        .param("loadQuantity", "1")
        .param("loadRatingValue", Double.toString(watts))
        .param("loadRatingUnit", "W")
        .param("loadPowerFactor", "0.9");
  }

  private long circuitId(long boardId, String description) {
    return jdbc.sql("SELECT id FROM circuit WHERE board_id = ? AND description = ?")
        .param(boardId)
        .param(description)
        .query(Long.class)
        .single();
  }

  private List<Finding> findings(long boardId, long circuitId) {
    return analysis.ofBoard(boardId).circuitFindings(boardId).get(circuitId).findings();
  }

  private static Finding of(List<Finding> findings, CheckKind kind) {
    return findings.stream()
        .filter(f -> f.check() == kind)
        .findFirst()
        .orElseThrow(() -> new AssertionError("no " + kind + " in " + findings));
  }

  @Test
  void necFindingsReachTheBoardPageAndTheWorkbook() throws Exception {
    long board = board(site());
    mvc.perform(
            circuit(
                board,
                1,
                "L1",
                "Bath receptacles",
                "BATHROOM",
                20,
                1,
                ConductorSize.AWG_12,
                "SOCKET_OUTLETS",
                600))
        .andExpect(status().is3xxRedirection());
    long bath = circuitId(board, "Bath receptacles");

    List<Finding> found = findings(board, bath);
    // 210.8(A)(1): bathroom receptacles need GFCI; none recorded
    assertThat(of(found, CheckKind.GROUND_FAULT_PROTECTION).verdict()).isEqualTo(Verdict.WARNING);
    // 110.9: a 10 kA breaker where the service's 22 kA (invented) is taken at the panel
    assertThat(of(found, CheckKind.INTERRUPTING_RATING).verdict()).isEqualTo(Verdict.DANGER);
    // 12 AWG, 40 ft, 5 A at 120 V: well within 3 % (a recommendation)
    assertThat(of(found, CheckKind.BRANCH_VOLTAGE_DROP).verdict()).isEqualTo(Verdict.PASS);

    mvc.perform(get("/boards/{id}", board).with(user("vi").roles("VIEWER")))
        .andExpect(status().isOk())
        .andExpect(content().string(Matchers.containsString("need GFCI protection")))
        .andExpect(content().string(Matchers.containsString("NEC 110.9")));

    byte[] xlsx =
        mvc.perform(get("/boards/{id}/export.xlsx", board).with(user("vi").roles("VIEWER")))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsByteArray();
    List<String> cells = new ArrayList<>();
    try (var workbook =
        new org.apache.poi.xssf.usermodel.XSSFWorkbook(new java.io.ByteArrayInputStream(xlsx))) {
      workbook.getSheet("Findings").forEach(row -> row.forEach(cell -> cells.add(cell.toString())));
    }
    assertThat(cells).anyMatch(text -> text.contains("need GFCI protection"));
    assertThat(cells).anyMatch(text -> text.contains("210.8(A)(1)"));
  }

  @Test
  void aMotorIsNotAssessedUntilItsHorsepowerIsRecorded() throws Exception {
    long board = board(site());
    mvc.perform(
            circuit(
                board,
                3,
                "L1_L2",
                "Well pump",
                "OUTDOORS",
                70,
                2,
                ConductorSize.AWG_8,
                "MOTOR",
                4500))
        .andExpect(status().is3xxRedirection());
    long pump = circuitId(board, "Well pump");
    Finding before = of(findings(board, pump), CheckKind.MOTOR_CONDUCTOR);
    assertThat(before.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(before.summary()).contains("motor horsepower not recorded");

    long load =
        jdbc.sql("SELECT id FROM load_item WHERE circuit_id = ?")
            .param(pump)
            .query(Long.class)
            .single();
    long version =
        jdbc.sql("SELECT version FROM load_item WHERE id = ?")
            .param(load)
            .query(Long.class)
            .single();
    mvc.perform(
            editor(post("/loads/{id}", load))
                .param("version", Long.toString(version))
                .param("description", "Well pump")
                .param("category", "MOTOR")
                .param("quantity", "1")
                .param("ratingValue", "4500")
                .param("ratingUnit", "W")
                .param("powerFactor", "0.9")
                .param("continuous", "false")
                .param("motorHorsepower", "5"))
        .andExpect(status().is3xxRedirection());
    List<Finding> after = findings(board, pump);
    // Table 430.248: 5 hp at 230 V 28 A (from memory); 8 AWG Cu 60 °C 40 A ≥ 35 A; 70 A ≤ 70 A
    Finding conductor = of(after, CheckKind.MOTOR_CONDUCTOR);
    assertThat(conductor.verdict()).as(conductor.summary()).isEqualTo(Verdict.PASS);
    assertThat(conductor.summary()).contains("28 A (Table 430.248)");
    assertThat(of(after, CheckKind.MOTOR_BREAKER).verdict()).isEqualTo(Verdict.PASS);

    // the circuit's page proposes an NEC breaker and an AWG conductor, never an IEC type B MCB
    mvc.perform(get("/circuits/{id}", pump).with(user("vi").roles("VIEWER")))
        .andExpect(status().isOk())
        .andExpect(content().string(Matchers.containsString("8 AWG")))
        .andExpect(content().string(Matchers.not(Matchers.containsString("type B"))));
  }

  @Test
  void aLocationOfTheOtherRuleSetIsRefusedBesideItsField() throws Exception {
    long board = board(site());
    mvc.perform(
            circuit(
                board,
                5,
                "L1",
                "Sauna heater",
                "SAUNA",
                20,
                1,
                ConductorSize.AWG_12,
                "SPACE_HEATING",
                1500))
        .andExpect(status().isUnprocessableContent())
        .andExpect(content().string(Matchers.containsString("not one of the NEC")));
    assertThat(
            jdbc.sql("SELECT count(*) FROM circuit WHERE board_id = ?")
                .param(board)
                .query(Long.class)
                .single())
        .isZero();
  }

  @Test
  void rooftopReceptaclesOnAPanelThatIsNoDwellingsNeedGfciUnder210_8B() throws Exception {
    // NEC 210.8(B)(3) rooftops (2020, from memory): a 120 V 20 A receptacle circuit
    long panel = panel(site(), "HP-1");
    mvc.perform(
            circuit(
                panel,
                1,
                "L1",
                "Roof receptacles",
                "ROOFTOP",
                20,
                1,
                ConductorSize.AWG_12,
                "SOCKET_OUTLETS",
                360))
        .andExpect(status().is3xxRedirection());
    Finding gfci =
        of(
            findings(panel, circuitId(panel, "Roof receptacles")),
            CheckKind.GROUND_FAULT_PROTECTION);
    assertThat(gfci.verdict()).as(gfci.summary()).isEqualTo(Verdict.WARNING);
    assertThat(gfci.reference()).contains("210.8(B)(3)");
  }

  @Test
  void aRecordedConduitReachesTheVoltageDropFindingAndTheApi() throws Exception {
    long board = board(site());
    mvc.perform(
            circuit(
                    board,
                    7,
                    "L1",
                    "Shed feed",
                    "OUTDOORS",
                    20,
                    1,
                    ConductorSize.AWG_12,
                    "LIGHTING",
                    1200)
                .param("cableConduit", "PVC"))
        .andExpect(status().is3xxRedirection());
    long id = circuitId(board, "Shed feed");
    Finding drop = of(findings(board, id), CheckKind.BRANCH_VOLTAGE_DROP);
    assertThat(drop.summary()).contains("PVC conduit (recorded)");
    mvc.perform(get("/api/circuits/{id}", id).with(user("vi").roles("VIEWER")))
        .andExpect(status().isOk())
        .andExpect(content().string(Matchers.containsString("\"cableConduit\":\"PVC\"")));
    // the circuit's editor offers the select on an NEC panelboard, the recorded one chosen
    mvc.perform(get("/circuits/{id}/edit", id).with(user("ed").roles("EDITOR")))
        .andExpect(status().isOk())
        .andExpect(content().string(Matchers.containsString("name=\"cableConduit\"")))
        .andExpect(content().string(Matchers.containsString("PVC conduit")));
  }
}
