package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.engine.dwelling.Worksheet;
import com.wayledger.engine.dwelling.WorksheetMethod;
import java.util.UUID;
import org.hamcrest.Matchers;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

/**
 * NEC Informative Annex D Example D4(b), the optional method for a multifamily dwelling (220.84),
 * entered as a user would on an NEC 120/240 V site: one meter-bank panel feeding 20 stored dwelling
 * panels, each with its range, heaters and water heater in two-pole spaces and its dwelling data.
 * D4(b) and Table 220.84 are from memory (no copy at hand); see docs/calculations/nec-dwelling.md.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class NecMultifamilyStoredPathIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired AnalysisService analysis;
  @Autowired JdbcClient jdbc;

  private MockHttpServletRequestBuilder editor(MockHttpServletRequestBuilder request) {
    return request.with(user("ed").roles("EDITOR")).with(csrf());
  }

  private long site() throws Exception {
    String name = "D4(b) " + UUID.randomUUID();
    mvc.perform(
            editor(post("/sites"))
                .param("name", name)
                .param("earthingSystem", "TN_C_S")
                .param("nominalVoltageVolts", "120")
                .param("phases", "1")
                .param("frequencyHertz", "60")
                .param("ruleSet", "NEC")
                .param("supplySystem", "SPLIT_PHASE_120_240"))
        .andExpect(status().is3xxRedirection());
    return jdbc.sql("SELECT id FROM site WHERE name = ?").param(name).query(Long.class).single();
  }

  private long board(long siteId, String reference, Long parentId, int amps) throws Exception {
    MockHttpServletRequestBuilder request =
        editor(post("/sites/{id}/boards", siteId))
            .param("reference", reference)
            .param("phases", "1")
            .param("wayCount", "12")
            .param("incomerKind", "MCCB")
            .param("incomerRatingAmps", Integer.toString(amps))
            .param("incomerPoles", "2")
            .param("incomerBreakingCapacityKiloAmps", "22")
            .param("unbalanceLimitPercent", "10")
            .param("coincidenceFactor", "1");
    if (parentId != null) {
      request.param("parentBoardId", parentId.toString());
    }
    mvc.perform(request).andExpect(status().is3xxRedirection());
    return jdbc.sql("SELECT id FROM board WHERE site_id = ? AND reference = ?")
        .param(siteId)
        .param(reference)
        .query(Long.class)
        .single();
  }

  /** A two-pole (240 V) circuit with one load line. */
  private void twoPole(
      long boardId, int way, String description, String category, int quantity, double watts)
      throws Exception {
    mvc.perform(
            editor(post("/boards/{id}/circuits", boardId))
                .param("wayNumber", Integer.toString(way))
                .param("position", "L1_L2")
                .param("description", description)
                .param("status", "IN_USE")
                .param("deviceKind", "MCB")
                .param("deviceCurve", "C")
                .param("deviceRatingAmps", "40")
                .param("devicePoles", "2")
                .param("deviceBreakingCapacityKiloAmps", "10")
                .param("loadDescription", description)
                .param("loadCategory", category)
                .param("loadQuantity", Integer.toString(quantity))
                .param("loadRatingValue", Double.toString(watts))
                .param("loadRatingUnit", "W")
                .param("loadPowerFactor", "1"))
        .andExpect(status().is3xxRedirection());
  }

  private Worksheet sheet(long boardId, WorksheetMethod method) {
    return analysis.ofBoard(boardId).dwellingWorksheets(boardId).stream()
        .filter(sheet -> sheet.method() == method)
        .findFirst()
        .orElseThrow(() -> new AssertionError("no " + method + " worksheet on board " + boardId));
  }

  @Test
  void meterBankOfExampleD4bThroughStoredPanels() throws Exception {
    // Annex D D4(b) (from memory): 20 units of 840 ft², two small-appliance circuits, laundry on
    // the premises (no laundry circuit), 8 kW range, four 1.5 kW heaters, 2.5 kW water heater
    long siteId = site();
    long bank = board(siteId, "Meter bank", null, 800);
    for (int unit = 1; unit <= 20; unit++) {
      long panel = board(siteId, "Unit " + unit, bank, 125);
      twoPole(panel, 1, "Range", "COOKING", 1, 8_000); // spaces 1 and 3
      twoPole(panel, 2, "Heaters", "SPACE_HEATING", 4, 1_500); // spaces 2 and 4
      twoPole(panel, 5, "Water heater", "WATER_HEATING_STORAGE", 1, 2_500); // spaces 5 and 7
      mvc.perform(
              editor(post("/boards/{id}/dwelling", panel))
                  .param("floorArea", "840")
                  .param("areaUnit", "FT2")
                  .param("smallApplianceCircuits", "2")
                  .param("laundryCircuits", "0")
                  .param("addition", "NONE"))
          .andExpect(status().is3xxRedirection());
    }

    Worksheet optional = sheet(bank, WorksheetMethod.MULTIFAMILY_OPTIONAL);
    // D4(b) (from memory): 22,020 VA per unit, 440,400 VA, Table 220.84 20 units 38 %:
    // 167,352 VA; 167,352 / 240 V = 697.3 A
    assertThat(optional.line("20 units, connected load").orElseThrow().resultVoltAmperes())
        .isCloseTo(440_400.0, within(1e-6));
    assertThat(optional.resultVoltAmperes()).isCloseTo(167_352.0, within(1e-6));
    assertThat(optional.amperesAt(240)).isCloseTo(697.3, within(0.05));

    mvc.perform(get("/boards/{id}", bank).with(user("vi").roles("VIEWER")))
        .andExpect(status().isOk())
        .andExpect(content().string(Matchers.containsString("167,352 VA")))
        .andExpect(content().string(Matchers.containsString("Table 220.84")));
    mvc.perform(get("/api/boards/{id}/dwelling", bank).with(user("vi").roles("VIEWER")))
        .andExpect(status().isOk())
        .andExpect(
            jsonPath("$.worksheets[?(@.method == 'MULTIFAMILY_OPTIONAL')].resultVoltAmperes")
                .value(Matchers.contains(167_352.0)));
  }
}
