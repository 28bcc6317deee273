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
import com.wayledger.engine.nec.ConductorSize;
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
                // 14 AWG stored as its area, 2.08 mm²
                .param("cableLineCsa", String.valueOf(ConductorSize.AWG_14.squareMillimetres()))
                .param("cableCpcCsa", String.valueOf(ConductorSize.AWG_14.squareMillimetres()))
                .param("cableMaterial", "COPPER")
                .param("cableInsulation", "THERMOSETTING_90")
                .param("cableLengthMetres", "12")
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
}
