package com.wayledger.inspection;

import static com.wayledger.support.Roles.editor;
import static com.wayledger.support.Roles.viewer;
import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.List;
import java.util.Map;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.annotation.DirtiesContext;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

/**
 * The inspection pages on the demo site (H2): the demo's two records of FLAT-1, the grid's grading,
 * bad input, the outcome confirmation, corrections by a new record, the PDF and the comparison.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles({"test", "demo"})
@DirtiesContext
class InspectionPagesIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired JdbcClient jdbc;

  @Test
  void laterDemoInspectionGradesTheSlowRcdAndTheLowInsulationAndCarriesTheCaution()
      throws Exception {
    mvc.perform(
            get("/boards/{b}/inspections/{id}", flat1(), inspection("2025-06-03")).with(viewer()))
        .andExpect(status().isOk())
        // IEC 61008-1 Table 1: 300 ms at IΔn for a general-type RCD
        .andExpect(content().string(containsString("RCD at IΔn 340 ms slower than 300 ms")))
        // BS 7671 Table 64 (from memory): ≥ 1.0 MΩ up to 500 V
        .andExpect(content().string(containsString("IR L–E 0.70 MΩ below the minimum 1.00 MΩ")))
        .andExpect(content().string(containsString("Unsatisfactory")))
        .andExpect(content().string(containsString("fell by more than half")))
        .andExpect(content().string(containsString("assist a competent person")));
  }

  @Test
  void gradingATypedGridMarksTheFailingCellAndProposesAnObservation() throws Exception {
    mvc.perform(grid("grade", Map.of(ring() + ".irLe", "0.4")))
        .andExpect(status().isOk())
        .andExpect(content().string(containsString("IR L–E 0.40 MΩ below the minimum")))
        .andExpect(content().string(containsString("name=\"observations[0].proposedText\"")))
        .andExpect(content().string(containsString("Urgent — potentially dangerous")))
        .andExpect(content().string(containsString("I confirm the outcome: Unsatisfactory")));
  }

  @Test
  void aTypoGets422WithTheMessageBesideItsCellAndNothingIsStored() throws Exception {
    long before = count();
    mvc.perform(grid("", Map.of(ring() + ".irLe", "1O0", "confirmedOutcome", "SATISFACTORY")))
        .andExpect(status().isUnprocessableContent())
        .andExpect(content().string(containsString("Enter a number, such as 0.45 or &gt;299.")))
        .andExpect(content().string(containsString("aria-invalid=\"true\"")));
    assertThat(count()).as("nothing stored").isEqualTo(before);
  }

  @Test
  void recordingNeedsTheInspectorToConfirmTheOutcomeTheObservationsLeadTo() throws Exception {
    long before = count();
    mvc.perform(grid("", Map.of(ring() + ".irLe", "250")))
        .andExpect(status().isUnprocessableContent())
        .andExpect(content().string(containsString("Confirm the outcome")));
    assertThat(count()).isEqualTo(before);
  }

  @Test
  void aConfirmedInspectionIsStoredAndShownWithItsObservation() throws Exception {
    long before = count();
    // the schedule checks of FLAT-1 already propose urgent observations, so the outcome is
    // unsatisfactory
    mvc.perform(
            grid(
                "",
                Map.of(
                    ring() + ".irLe",
                    "250",
                    "observations[0].urgency",
                    "ADVISORY",
                    "observations[0].text",
                    "Label the board's ways",
                    "observations[0].decision",
                    "keep",
                    "confirmedOutcome",
                    "UNSATISFACTORY")))
        .andExpect(status().is3xxRedirection());
    assertThat(count()).isEqualTo(before + 1);
    long id = jdbc.sql("SELECT MAX(id) FROM inspection").query(Long.class).single();
    mvc.perform(get("/boards/{b}/inspections/{id}", flat1(), id).with(viewer()))
        .andExpect(status().isOk())
        .andExpect(content().string(containsString("Label the board&#39;s ways")));
  }

  @Test
  void aViewerCanReadButNotRecord() throws Exception {
    mvc.perform(get("/boards/{b}/inspections/new", flat1()).with(viewer()))
        .andExpect(status().isForbidden());
    mvc.perform(
            post("/boards/{b}/inspections", flat1())
                .with(viewer())
                .with(csrf())
                .param("inspector", "Vera"))
        .andExpect(status().isForbidden());
    mvc.perform(get("/boards/{b}/inspections", flat1()).with(viewer())).andExpect(status().isOk());
  }

  @Test
  void aCorrectionIsANewRecordAndTheOldOneStaysAsItWas() throws Exception {
    long old = inspection("2022-05-12");
    Map<String, Object> before = row(old);
    long results = resultCount(old);
    mvc.perform(
            get("/boards/{b}/inspections/new", flat1()).param("corrects", "" + old).with(editor()))
        .andExpect(status().isOk())
        .andExpect(content().string(containsString("Correcting record " + old)));
    long count = count();
    mvc.perform(
            grid(
                "",
                Map.of(
                    "correctsId",
                    "" + old,
                    ring() + ".irLe",
                    "210",
                    "inspectedOn",
                    "2022-05-12",
                    "confirmedOutcome",
                    "UNSATISFACTORY")))
        .andExpect(status().is3xxRedirection());
    assertThat(count()).isEqualTo(count + 1);
    assertThat(row(old)).as("the corrected record is unchanged").isEqualTo(before);
    assertThat(resultCount(old)).isEqualTo(results);
    assertThat(
            jdbc.sql(
                    "SELECT corrects_id FROM inspection WHERE id = (SELECT MAX(id) FROM inspection)")
                .query(Long.class)
                .single())
        .isEqualTo(old);
  }

  @Test
  void theAppHasNoWayToChangeOrRemoveARecord() throws Exception {
    long id = inspection("2022-05-12");
    mvc.perform(put("/boards/{b}/inspections/{id}", flat1(), id).with(editor()).with(csrf()))
        .andExpect(status().isMethodNotAllowed());
    mvc.perform(delete("/boards/{b}/inspections/{id}", flat1(), id).with(editor()).with(csrf()))
        .andExpect(status().isMethodNotAllowed());
    mvc.perform(post("/boards/{b}/inspections/{id}", flat1(), id).with(editor()).with(csrf()))
        .andExpect(status().isMethodNotAllowed());
  }

  @Test
  void thePdfReportIsAPdfNamingTheBoardWithTheCaution() throws Exception {
    byte[] pdf =
        mvc.perform(
                get("/boards/{b}/inspections/{id}/report.pdf", flat1(), inspection("2025-06-03"))
                    .with(viewer()))
            .andExpect(status().isOk())
            .andExpect(header().string("Content-Type", "application/pdf"))
            .andReturn()
            .getResponse()
            .getContentAsByteArray();
    try (PDDocument document = Loader.loadPDF(pdf)) {
      String text = new PDFTextStripper().getText(document);
      assertThat(text).contains("FLAT-1", "Caution", "Inspector's name, signature and date");
      assertThat(text).contains("Compared with the previous inspection");
    }
  }

  @Test
  void comparingTheTwoDemoInspectionsListsTheAddedLoadAndTheDrift() throws Exception {
    mvc.perform(
            get("/boards/{b}/inspections/compare", flat1())
                .param("from", "" + inspection("2022-05-12"))
                .param("to", "" + inspection("2025-06-03"))
                .with(viewer()))
        .andExpect(status().isOk())
        .andExpect(content().string(containsString("Dishwasher")))
        .andExpect(content().string(containsString("load changed")))
        .andExpect(content().string(containsString("RCD at IΔn 26 ms → 340 ms")));
  }

  @Test
  void theBoardWorkbookCarriesTheLatestResultsGradedWithTheCaution() throws Exception {
    byte[] xlsx =
        mvc.perform(get("/boards/{b}/export.xlsx", flat1()).with(viewer()))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsByteArray();
    try (var workbook =
        new org.apache.poi.xssf.usermodel.XSSFWorkbook(new java.io.ByteArrayInputStream(xlsx))) {
      var sheet = workbook.getSheet("Test results");
      assertThat(sheet).as("results sheet").isNotNull();
      StringBuilder text = new StringBuilder();
      sheet.forEach(row -> row.forEach(cell -> text.append(cell.toString()).append('|')));
      assertThat(text.toString())
          .contains(
              "Caution: ", "2025-06-03", "RCD at IΔn 340 ms slower than 300 ms", "UNSATISFACTORY");
    }
  }

  // --- helpers ---

  private MockHttpServletRequestBuilder grid(String action, Map<String, String> values) {
    MockHttpServletRequestBuilder request =
        post("/boards/{b}/inspections" + (action.isEmpty() ? "" : "/" + action), flat1())
            .with(editor())
            .with(csrf())
            .param("inspectedOn", values.getOrDefault("inspectedOn", "2026-01-15"))
            .param("inspector", "Test Inspector")
            .param("testCelsius", "20")
            .param("insulationTestVolts", "500");
    List<Long> circuits = circuits();
    for (int i = 0; i < circuits.size(); i++) {
      request.param("rows[" + i + "].circuitId", "" + circuits.get(i));
    }
    values.forEach(
        (name, value) -> {
          if (!name.equals("inspectedOn")) {
            request.param(name, value);
          }
        });
    return request;
  }

  private String ring() {
    List<Long> circuits = circuits();
    long ring =
        jdbc.sql(
                "SELECT id FROM circuit WHERE board_id = ? AND description = 'Sockets ring, living"
                    + " and bedrooms'")
            .param(flat1())
            .query(Long.class)
            .single();
    return "rows[" + circuits.indexOf(ring) + "]";
  }

  private List<Long> circuits() {
    return jdbc.sql(
            "SELECT id FROM circuit WHERE board_id = ? AND status = 'IN_USE' ORDER BY way_number,"
                + " position")
        .param(flat1())
        .query(Long.class)
        .list();
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

  private long resultCount(long id) {
    return jdbc.sql("SELECT COUNT(*) FROM inspection_result WHERE inspection_id = ?")
        .param(id)
        .query(Long.class)
        .single();
  }

  private Map<String, Object> row(long id) {
    return jdbc.sql("SELECT * FROM inspection WHERE id = ?").param(id).query().singleRow();
  }
}
