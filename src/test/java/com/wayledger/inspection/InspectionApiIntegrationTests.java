package com.wayledger.inspection;

import static com.wayledger.support.Roles.editor;
import static com.wayledger.support.Roles.viewer;
import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.hasItem;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.annotation.DirtiesContext;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;

/** The inspection API on the demo site: grade, create with results in bulk, read, compare. */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles({"test", "demo"})
@DirtiesContext
class InspectionApiIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired JdbcClient jdbc;

  @Test
  void gradingProposesAnUrgentObservationForASlowRcdAndStoresNothing() throws Exception {
    long before = count();
    mvc.perform(
            post("/api/boards/{b}/inspections/grade", flat1())
                .with(editor())
                .contentType(MediaType.APPLICATION_JSON)
                .content(body(312.0, null)))
        .andExpect(status().isOk())
        // IEC 61008-1 Table 1: 300 ms at IΔn
        .andExpect(
            jsonPath(
                "$.circuits[*].values[*].message", hasItem("RCD at IΔn 312 ms slower than 300 ms")))
        .andExpect(jsonPath("$.proposedObservations[*].urgency", hasItem("URGENT")))
        .andExpect(jsonPath("$.outcome").value("UNSATISFACTORY"));
    assertThat(count()).isEqualTo(before);
  }

  @Test
  void createStoresTheRecordWithExactlyTheObservationsSentAndReadsItBackGraded() throws Exception {
    String location =
        mvc.perform(
                post("/api/boards/{b}/inspections", flat1())
                    .with(editor())
                    .contentType(MediaType.APPLICATION_JSON)
                    .content(body(25.0, "SATISFACTORY")))
            .andExpect(status().isCreated())
            .andExpect(jsonPath("$.outcome").value("SATISFACTORY"))
            .andExpect(jsonPath("$.observations[0].text").value("Renew the door chart"))
            .andReturn()
            .getResponse()
            .getHeader("Location");
    mvc.perform(get(location).with(viewer()))
        .andExpect(status().isOk())
        .andExpect(
            jsonPath(
                "$.grading.circuits[*].values[*].message",
                hasItem("RCD at IΔn 25 ms within ≤ 300 ms")));
  }

  @Test
  void aConfirmedOutcomeTheObservationsDoNotLeadToIs422AndNothingIsStored() throws Exception {
    long before = count();
    // an urgent observation makes the outcome unsatisfactory (common practice)
    mvc.perform(
            post("/api/boards/{b}/inspections", flat1())
                .with(editor())
                .contentType(MediaType.APPLICATION_JSON)
                .content(body(312.0, "SATISFACTORY").replace("ADVISORY", "URGENT")))
        .andExpect(status().isUnprocessableContent())
        .andExpect(jsonPath("$.fields[0].field").value("confirmedOutcome"));
    assertThat(count()).isEqualTo(before);
  }

  @Test
  void aMalformedValueIs400() throws Exception {
    mvc.perform(
            post("/api/boards/{b}/inspections", flat1())
                .with(editor())
                .contentType(MediaType.APPLICATION_JSON)
                .content(
                    "{\"inspectedOn\":\"2026-01-10\",\"results\":[{\"circuitId\":1,\"zs\":\"x\","
                        + "\"loopImpedanceOhms\":\"abc\"}]}"))
        .andExpect(status().isBadRequest());
  }

  @Test
  void aViewerCannotCreate() throws Exception {
    mvc.perform(
            post("/api/boards/{b}/inspections", flat1())
                .with(viewer())
                .contentType(MediaType.APPLICATION_JSON)
                .content(body(25.0, "SATISFACTORY")))
        .andExpect(status().isForbidden());
  }

  @Test
  void comparisonOfTheDemoInspectionsNamesTheDrift() throws Exception {
    long earlier = inspection("2022-05-12");
    long later = inspection("2025-06-03");
    mvc.perform(
            get("/api/boards/{b}/inspections/compare", flat1())
                .param("from", "" + earlier)
                .param("to", "" + later)
                .with(viewer()))
        .andExpect(status().isOk())
        .andExpect(jsonPath("$.changes[*].category", hasItem("load")))
        .andExpect(
            jsonPath("$.drift[*].moves[?(@.attention == true)].quantity", hasItem("IR L–E")));
  }

  /** The ring's RCBO timed at IΔn; an advisory observation only. */
  private String body(double rcdMillis, String confirmed) {
    long ring =
        jdbc.sql(
                "SELECT id FROM circuit WHERE board_id = ? AND description = 'Sockets ring, living"
                    + " and bedrooms'")
            .param(flat1())
            .query(Long.class)
            .single();
    return """
        {"inspectedOn":"2026-02-01","inspector":"Api Inspector","testCelsius":20,
         "insulationTestVolts":500,"mainBondingPresent":true,
         "confirmedOutcome":%s,
         "results":[{"circuitId":%d,"insulationLineEarthMegaohms":200,"rcdRatedMillis":%s,
                     "rcdButtonWorks":true}],
         "observations":[{"urgency":"ADVISORY","text":"Renew the door chart"}]}
        """
        .formatted(confirmed == null ? "null" : "\"" + confirmed + "\"", ring, rcdMillis);
  }

  private long flat1() {
    return jdbc.sql("SELECT id FROM board WHERE reference = 'FLAT-1'").query(Long.class).single();
  }

  private long inspection(String date) {
    return jdbc.sql(
            "SELECT MIN(id) FROM inspection WHERE board_id = ? AND inspected_on = CAST(? AS DATE)")
        .params(flat1(), date)
        .query(Long.class)
        .single();
  }

  private long count() {
    return jdbc.sql("SELECT COUNT(*) FROM inspection").query(Long.class).single();
  }
}
