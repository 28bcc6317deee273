package com.wayledger.site;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.board.AnalysisService;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;
import java.util.UUID;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;

/**
 * A site's rule set, chosen when it is created (page and API), fixed afterwards, shown on result
 * pages, and used for the checks of its stored circuits. Site, board and circuit are invented.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class RuleSetIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired SiteService sites;
  @Autowired AnalysisService analysis;
  @Autowired JdbcClient jdbc;

  private String siteJson(String name, String ruleSet, String system) {
    return """
        {"name": "%s", "earthingSystem": "TN_C_S", "nominalVoltageVolts": 230, "phases": 3,
         "frequencyHertz": 60, "prospectiveFaultCurrentKiloAmps": 10,
         "ruleSet": %s, "supplySystem": %s}
        """
        .formatted(
            name,
            ruleSet == null ? "null" : "\"" + ruleSet + "\"",
            system == null ? "null" : "\"" + system + "\"");
  }

  private long createNecSite(String system) throws Exception {
    String name = "Invented duplex " + UUID.randomUUID();
    mvc.perform(
            post("/api/sites")
                .with(user("ed").roles("EDITOR"))
                .with(csrf())
                .contentType(MediaType.APPLICATION_JSON)
                .content(siteJson(name, "NEC", system)))
        .andExpect(status().isCreated());
    return jdbc.sql("SELECT id FROM site WHERE name = ?").param(name).query(Long.class).single();
  }

  @Test
  void anNecSiteCreatedThroughTheApiTakesItsSystemsVoltageAndLines() throws Exception {
    mvc.perform(
            post("/api/sites")
                .with(user("ed").roles("EDITOR"))
                .with(csrf())
                .contentType(MediaType.APPLICATION_JSON)
                .content(siteJson("Split " + UUID.randomUUID(), "NEC", "SPLIT_PHASE_120_240")))
        .andExpect(status().isCreated())
        .andExpect(jsonPath("$.ruleSet").value("NEC"))
        .andExpect(jsonPath("$.supplySystem").value("SPLIT_PHASE_120_240"))
        .andExpect(jsonPath("$.nominalVoltageVolts").value(120.0))
        .andExpect(jsonPath("$.phases").value(1));
  }

  @Test
  void aSiteWithoutARuleSetIsAnIecSiteAsBefore() throws Exception {
    mvc.perform(
            post("/api/sites")
                .with(user("ed").roles("EDITOR"))
                .with(csrf())
                .contentType(MediaType.APPLICATION_JSON)
                .content(siteJson("Plain " + UUID.randomUUID(), null, null)))
        .andExpect(status().isCreated())
        .andExpect(jsonPath("$.ruleSet").value("IEC"))
        .andExpect(jsonPath("$.supplySystem").value("IEC_WYE"))
        .andExpect(jsonPath("$.nominalVoltageVolts").value(230.0));
  }

  @Test
  void aSupplySystemOfAnotherRuleSetIsRefusedAndNothingIsStored() throws Exception {
    String name = "Mixed " + UUID.randomUUID();
    mvc.perform(
            post("/api/sites")
                .with(user("ed").roles("EDITOR"))
                .with(csrf())
                .contentType(MediaType.APPLICATION_JSON)
                .content(siteJson(name, "NEC", "IEC_WYE")))
        .andExpect(status().is4xxClientError());
    assertThat(
            jdbc.sql("SELECT COUNT(*) FROM site WHERE name = ?")
                .param(name)
                .query(Long.class)
                .single())
        .as("nothing stored")
        .isZero();
  }

  @Test
  void theRuleSetCannotBeChangedAfterCreation() throws Exception {
    long id = createNecSite("WYE_208Y_120");
    Site site = sites.get(id);

    mvc.perform(
            put("/api/sites/{id}", id)
                .with(user("ed").roles("EDITOR"))
                .with(csrf())
                .contentType(MediaType.APPLICATION_JSON)
                .content(siteJson(site.getName(), "IEC", "IEC_WYE")))
        .andExpect(status().is4xxClientError());

    assertThat(sites.get(id).getRuleSet()).isEqualTo("NEC");
    assertThat(sites.get(id).getSupplySystem()).isEqualTo(SupplySystem.WYE_208Y_120);
  }

  @Test
  void theNewSitePageOffersTheRuleSets() throws Exception {
    String page =
        mvc.perform(get("/sites/new").with(user("ed").roles("EDITOR")))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(page)
        .contains("name=\"ruleSet\"")
        .contains("NEC (NFPA 70)")
        .contains("120/240 V single-phase three-wire");
  }

  @Test
  void aStoredCircuitOnAnNecSiteIsCheckedByTheNecSetAndTheBoardPageSaysSo() throws Exception {
    long siteId = createNecSite("SPLIT_PHASE_120_240");
    mvc.perform(
            post("/sites/{id}/boards", siteId)
                .with(user("ed").roles("EDITOR"))
                .with(csrf())
                .param("reference", "P-1")
                .param("phases", "1")
                .param("wayCount", "42")
                .param("incomerKind", "MCCB")
                .param("incomerRatingAmps", "200")
                .param("incomerPoles", "2")
                .param("incomerBreakingCapacityKiloAmps", "22")
                .param("unbalanceLimitPercent", "10")
                .param("coincidenceFactor", "1"))
        .andExpect(status().is3xxRedirection());
    long boardId =
        jdbc.sql("SELECT id FROM board WHERE site_id = ?").param(siteId).query(Long.class).single();
    mvc.perform(
            post("/boards/{id}/circuits", boardId)
                .with(user("ed").roles("EDITOR"))
                .with(csrf())
                .param("wayNumber", "1")
                .param("position", "L1")
                .param("description", "Kitchen counter")
                .param("status", "IN_USE")
                .param("deviceKind", "MCB")
                .param("deviceRatingAmps", "20")
                .param("deviceBreakingCapacityKiloAmps", "10")
                // an NEC site's page takes sizes as AWG/kcmil and lengths in feet
                .param("cableLineSize", "14 AWG")
                .param("cableCpcSize", "14 AWG")
                .param("cableMaterial", "COPPER")
                .param("cableInsulation", "THERMOSETTING_90")
                .param("cableLengthFeet", "40")
                .param("cableAmbientCelsius", "30")
                .param("cableGroupedCircuits", "1")
                .param("loadDescription", "Toaster")
                .param("loadCategory", "FIXED_APPLIANCE")
                .param("loadQuantity", "1")
                .param("loadRatingValue", "1200")
                .param("loadRatingUnit", "W")
                .param("loadPowerFactor", "1"))
        .andExpect(status().is3xxRedirection());
    long circuitId =
        jdbc.sql("SELECT id FROM circuit WHERE board_id = ?")
            .param(boardId)
            .query(Long.class)
            .single();

    List<Finding> findings =
        analysis.ofSite(siteId).circuitFindings(boardId).get(circuitId).findings();

    assertThat(findings)
        .as("NEC 240.4(D): a 20 A breaker on 14 AWG copper")
        .anySatisfy(
            f -> {
              assertThat(f.check()).isEqualTo(CheckKind.SMALL_CONDUCTOR);
              assertThat(f.verdict()).isEqualTo(Verdict.DANGER);
              assertThat(f.reference()).contains("240.4(D)");
            });
    String boardPage =
        mvc.perform(get("/boards/{id}", boardId).with(user("ed").roles("EDITOR")))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(boardPage)
        .as("the result page names the rule set beside the caution")
        .contains("Checked against NEC (NFPA 70); supply 120/240 V single-phase three-wire.");
  }

  private long splitPhaseBoard(long siteId) throws Exception {
    mvc.perform(
            post("/sites/{id}/boards", siteId)
                .with(user("ed").roles("EDITOR"))
                .with(csrf())
                .param("reference", "P-2")
                .param("phases", "1")
                .param("wayCount", "42")
                .param("unbalanceLimitPercent", "10")
                .param("coincidenceFactor", "1"))
        .andExpect(status().is3xxRedirection());
    return jdbc.sql("SELECT id FROM board WHERE site_id = ?")
        .param(siteId)
        .query(Long.class)
        .single();
  }

  private org.springframework.test.web.servlet.ResultActions addCircuit(
      long boardId, int way, String position, double watts) throws Exception {
    return mvc.perform(
        post("/boards/{id}/circuits", boardId)
            .with(user("ed").roles("EDITOR"))
            .with(csrf())
            .param("wayNumber", String.valueOf(way))
            .param("position", position)
            .param("description", "Load " + way)
            .param("status", "IN_USE")
            .param("deviceKind", "MCB")
            .param("deviceRatingAmps", "30")
            .param("loadDescription", "Heater")
            .param("loadCategory", "OTHER")
            .param("loadQuantity", "1")
            .param("loadRatingValue", String.valueOf(watts))
            .param("loadRatingUnit", "W")
            .param("loadPowerFactor", "1"));
  }

  @Test
  void aTwoPoleCircuitIsStoredOnBothLinesAndPutsNothingOnTheNeutral() throws Exception {
    long siteId = createNecSite("SPLIT_PHASE_120_240");
    long boardId = splitPhaseBoard(siteId);
    // 2400 W at 120 V on A (20 A); a 4800 W water heater at 240 V on A–B (20 A on each line)
    addCircuit(boardId, 1, "L1", 2400).andExpect(status().is3xxRedirection());
    addCircuit(boardId, 2, "L1_L2", 4800).andExpect(status().is3xxRedirection());

    assertThat(
            jdbc.sql(
                    "SELECT way_number || ':' || phase FROM way_slot WHERE board_id = ?"
                        + " AND way_number IN (2, 4) ORDER BY way_number")
                .param(boardId)
                .query(String.class)
                .list())
        .as("the two-pole breaker at space 2 takes spaces 2 (row 1, A) and 4 (row 2, B)")
        .containsExactly("2:L1", "4:L2");
    var demand = analysis.ofSite(siteId).boardDemand(boardId);
    assertThat(demand.lines()).as("a 120/240 V board has lines A and B").isEqualTo(2);
    assertThat(demand.phases().get(0).currentAmps())
        .as("line A: 20 A + 20 A")
        .isCloseTo(40.0, org.assertj.core.api.Assertions.within(1e-6));
    assertThat(demand.phases().get(1).currentAmps())
        .as("line B: 20 A")
        .isCloseTo(20.0, org.assertj.core.api.Assertions.within(1e-6));
    assertThat(demand.neutralCurrentAmps())
        .as("only the 120 V load returns on the neutral")
        .isCloseTo(20.0, org.assertj.core.api.Assertions.within(1e-6));
    String schedule =
        mvc.perform(get("/boards/{id}/schedule", boardId).with(user("ed").roles("EDITOR")))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(schedule)
        .as("the panelboard layout, the heater spanning spaces 2 and 4 on lines A and B")
        .contains("spaces 2/4 · lines A–B");
  }

  @Test
  void aTwoPolePositionIsRefusedOnAnIecBoard() throws Exception {
    Site site =
        sites.create(
            new SiteForm(
                "Iec " + UUID.randomUUID(),
                null,
                com.wayledger.engine.EarthingSystem.TN_C_S,
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
    mvc.perform(
            post("/sites/{id}/boards", site.getId())
                .with(user("ed").roles("EDITOR"))
                .with(csrf())
                .param("reference", "DB-1")
                .param("phases", "3")
                .param("wayCount", "12")
                .param("unbalanceLimitPercent", "10")
                .param("coincidenceFactor", "1"))
        .andExpect(status().is3xxRedirection());
    long boardId =
        jdbc.sql("SELECT id FROM board WHERE site_id = ?")
            .param(site.getId())
            .query(Long.class)
            .single();

    addCircuit(boardId, 1, "L1_L2", 4800).andExpect(status().is4xxClientError());

    assertThat(
            jdbc.sql("SELECT COUNT(*) FROM circuit WHERE board_id = ?")
                .param(boardId)
                .query(Long.class)
                .single())
        .as("nothing stored")
        .isZero();
  }
}
