package com.wayledger.inspection;

import static com.wayledger.support.Roles.editor;
import static com.wayledger.support.Roles.viewer;
import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.engine.inspection.Grade;
import com.wayledger.engine.inspection.GradedValue;
import java.io.ByteArrayOutputStream;
import java.time.LocalDate;
import java.util.List;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.annotation.DirtiesContext;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

/**
 * Test results imported from a workbook built with POI into the demo's FLAT-1 (H2 here; the
 * PostgreSQL subclass runs the same on PostgreSQL): the columns guessed from the trade's words, the
 * rows matched by way and graded, recorded as a new inspection; a bad cell reported beside its row
 * with 422 and nothing recorded.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles({"test", "demo"})
@DirtiesContext
class ResultImportIntegrationTests {

  static final List<String> HEADERS =
      List.of(
          "Cct",
          "Circuit",
          "R1+R2 (Ω)",
          "r1",
          "rn",
          "r2",
          "IR L-L",
          "IR L-E",
          "IR N-E",
          "Polarity",
          "Zs",
          "RCD ms",
          "RCD 5x ms");

  @Autowired MockMvc mvc;
  @Autowired JdbcClient jdbc;
  @Autowired InspectionService inspections;

  @Test
  void aWorkbookOfResultsBecomesANewInspectionWithEveryValueGraded() throws Exception {
    long before = count();
    long previousLatest = latestId();
    String token = upload(workbook("0.45"));

    MvcResult columns =
        mvc.perform(get(importPath(token)).with(editor())).andExpect(status().isOk()).andReturn();
    @SuppressWarnings("unchecked")
    List<ResultColumn> guessed =
        (List<ResultColumn>) columns.getModelAndView().getModel().get("mapping");
    assertThat(guessed)
        .as("columns guessed from their headers")
        .containsExactly(
            ResultColumn.WAY,
            ResultColumn.DESCRIPTION,
            ResultColumn.R1R2,
            ResultColumn.RING_R1,
            ResultColumn.RING_RN,
            ResultColumn.RING_R2,
            ResultColumn.IR_LL,
            ResultColumn.IR_LE,
            ResultColumn.IR_NE,
            ResultColumn.POLARITY,
            ResultColumn.ZS,
            ResultColumn.RCD_RATED,
            ResultColumn.RCD_FIVE);

    MvcResult preview =
        mvc.perform(filled(post(importPath(token) + "/preview"), guessed, ""))
            .andExpect(status().isOk())
            .andReturn();
    ResultImportPlan plan = (ResultImportPlan) preview.getModelAndView().getModel().get("plan");
    assertThat(plan.isAllValid()).as("every row reads: %s", plan.rows()).isTrue();
    assertThat(preview.getResponse().getContentAsString())
        .contains("import-row-3", "Cooker", "Sockets ring");
    assertThat(count()).as("a preview records nothing").isEqualTo(before);

    String outcome = plan.sheet().outcome().name();
    MvcResult recorded =
        mvc.perform(filled(post(importPath(token)), guessed, outcome))
            .andExpect(status().is3xxRedirection())
            .andReturn();

    assertThat(count()).as("one new record").isEqualTo(before + 1);
    long id = latestId();
    assertThat(id).isGreaterThan(previousLatest);
    assertThat(recorded.getResponse().getRedirectedUrl())
        .isEqualTo("/boards/" + flat1() + "/inspections/" + id);
    InspectionRecord record = inspections.get(flat1(), id);
    assertThat(record.inspector()).isEqualTo("Imported Inspector");
    assertThat(record.results()).as("one row per circuit in the sheet").hasSize(2);
    InspectionSheet graded = inspections.graded(record);
    SheetRow cooker = row(graded, "Cooker");
    SheetRow ring = row(graded, "Sockets ring, living and bedrooms");

    // BS 7671 Table 64 / IEC 60364-6 Table 6A (from memory): at least 1 MΩ at 500 V DC up to 500 V
    assertThat(value(cooker, "IR N–E").measured()).isEqualTo(0.6);
    assertThat(value(cooker, "IR N–E").grade()).isEqualTo(Grade.FAIL);
    assertThat(value(cooker, "IR L–E").grade()).isEqualTo(Grade.PASS);
    // BS 7671 Table 41.3: B32 at most 1.37 Ω; 80 % of it for a reading at ambient (common practice)
    assertThat(value(cooker, "Zs").measured()).isEqualTo(0.45);
    assertThat(value(cooker, "Zs").grade()).isEqualTo(Grade.PASS);
    // IEC 61008-1 Table 1 (from memory): a general-type 30 mA device opens within 300 ms at IΔn
    assertThat(value(ring, "RCD at IΔn").measured()).isEqualTo(22.0);
    assertThat(value(ring, "RCD at IΔn").grade()).isEqualTo(Grade.PASS);
    // ring end to end: r1 and rn within 0.05 Ω of each other (common practice)
    assertThat(value(ring, "ring r1/rn").grade()).isEqualTo(Grade.PASS);
    assertThat(ring.entry().polarity()).as("a tick reads as polarity correct").isEqualTo("ok");
    assertThat(record.observations())
        .as("the failing N–E reading proposed and kept as an observation")
        .anyMatch(o -> o.text().contains("IR N–E"));
  }

  @Test
  void aBadCellIsReportedBesideItsRowWith422AndNothingIsRecorded() throws Exception {
    long before = count();
    String token = upload(workbook("0.6x"));
    List<ResultColumn> guessed = ResultColumnGuesser.guess(HEADERS);

    MvcResult refused =
        mvc.perform(filled(post(importPath(token)), guessed, "UNSATISFACTORY"))
            .andExpect(status().is(422))
            .andReturn();

    String page = refused.getResponse().getContentAsString();
    String badRow = rowHtml(page, 4);
    assertThat(badRow)
        .as("the ring's row (sheet row 4) carries the Zs problem")
        .contains("Zs Ω: Enter a number, such as 0.45 or &gt;299.");
    assertThat(rowHtml(page, 3))
        .as("the cooker's row has no problem")
        .doesNotContain("class=\"error\"");
    assertThat(rowHtml(page, 5))
        .as("a way the board does not have")
        .contains("No circuit in use at way 99 of this board.");
    assertThat(page).contains("2 rows need correcting");
    assertThat(count()).as("nothing recorded").isEqualTo(before);
  }

  @Test
  void aViewerCannotOpenTheImport() throws Exception {
    mvc.perform(get("/boards/{b}/inspections/import", flat1()).with(viewer()))
        .andExpect(status().isForbidden());
  }

  // --- helpers ---

  /** Sheet rows 3 (cooker), 4 (ring) and, for the bad case, 5 (a way that is not there). */
  private static byte[] workbook(String ringZs) throws Exception {
    try (XSSFWorkbook book = new XSSFWorkbook();
        ByteArrayOutputStream out = new ByteArrayOutputStream()) {
      Sheet sheet = book.createSheet("Results");
      sheet.createRow(0).createCell(0).setCellValue("Periodic test results, flat 1");
      Row header = sheet.createRow(1);
      for (int c = 0; c < HEADERS.size(); c++) {
        header.createCell(c).setCellValue(HEADERS.get(c));
      }
      Row cooker = sheet.createRow(2);
      cooker.createCell(0).setCellValue(1);
      cooker.createCell(1).setCellValue("Cooker");
      cooker.createCell(2).setCellValue(0.12);
      cooker.createCell(6).setCellValue(">299");
      cooker.createCell(7).setCellValue(200);
      cooker.createCell(8).setCellValue(0.6);
      cooker.createCell(9).setCellValue("✓");
      cooker.createCell(10).setCellValue(0.45);
      cooker.createCell(11).setCellValue("N/A");
      Row ring = sheet.createRow(3);
      ring.createCell(0).setCellValue(3);
      ring.createCell(1).setCellValue("Sockets ring");
      ring.createCell(2).setCellValue(0.35);
      ring.createCell(3).setCellValue(0.52);
      ring.createCell(4).setCellValue(0.53);
      ring.createCell(5).setCellValue(0.86);
      ring.createCell(6).setCellValue(">299");
      ring.createCell(7).setCellValue(150);
      ring.createCell(8).setCellValue(150);
      ring.createCell(9).setCellValue("✓");
      if (ringZs.matches("[0-9.]+")) {
        ring.createCell(10).setCellValue(Double.parseDouble(ringZs));
      } else {
        ring.createCell(10).setCellValue(ringZs);
      }
      ring.createCell(11).setCellValue(22);
      ring.createCell(12).setCellValue(12);
      if (!ringZs.matches("[0-9.]+")) {
        Row nowhere = sheet.createRow(4);
        nowhere.createCell(0).setCellValue(99);
        nowhere.createCell(7).setCellValue(200);
      }
      book.write(out);
      return out.toByteArray();
    }
  }

  private String upload(byte[] bytes) throws Exception {
    MvcResult uploaded =
        mvc.perform(
                multipart("/boards/{b}/inspections/import", flat1())
                    .file(
                        new MockMultipartFile(
                            "file", "results.xlsx", "application/octet-stream", bytes))
                    .with(editor())
                    .with(csrf()))
            .andExpect(status().is3xxRedirection())
            .andReturn();
    String location = uploaded.getResponse().getRedirectedUrl();
    assertThat(location).startsWith("/boards/" + flat1() + "/inspections/import/");
    return location.substring(location.lastIndexOf('/') + 1);
  }

  private MockHttpServletRequestBuilder filled(
      MockHttpServletRequestBuilder request, List<ResultColumn> mapping, String outcome) {
    request
        .with(editor())
        .with(csrf())
        .param("sheet", "0")
        .param("inspectedOn", LocalDate.now().minusDays(2).toString())
        .param("inspector", "Imported Inspector")
        .param("instruments", "MFT-0000 (invented)")
        .param("testCelsius", "20")
        .param("insulationTestVolts", "500")
        .param("confirmedOutcome", outcome);
    for (int c = 0; c < mapping.size(); c++) {
      request.param("column" + c, mapping.get(c).name());
    }
    return request;
  }

  private String importPath(String token) {
    return "/boards/" + flat1() + "/inspections/import/" + token;
  }

  /** The HTML of the preview row for a sheet row number. */
  private static String rowHtml(String page, int sheetRow) {
    int start = page.indexOf("id=\"import-row-" + sheetRow + "\"");
    assertThat(start).as("preview row %d shown", sheetRow).isNotNegative();
    return page.substring(start, page.indexOf("</tr>", start));
  }

  private static SheetRow row(InspectionSheet sheet, String description) {
    return sheet.rows().stream()
        .filter(r -> r.description().equals(description))
        .findFirst()
        .orElseThrow(() -> new AssertionError("no row for " + description));
  }

  private static GradedValue value(SheetRow row, String quantity) {
    return row.graded().stream()
        .filter(v -> v.quantity().equals(quantity))
        .findFirst()
        .orElseThrow(() -> new AssertionError("no graded " + quantity + " on " + row));
  }

  private long count() {
    return jdbc.sql("SELECT COUNT(*) FROM inspection WHERE board_id = ?")
        .param(flat1())
        .query(Long.class)
        .single();
  }

  private long latestId() {
    return jdbc.sql("SELECT COALESCE(MAX(id), 0) FROM inspection").query(Long.class).single();
  }

  long flat1() {
    return jdbc.sql("SELECT id FROM board WHERE reference = 'FLAT-1'").query(Long.class).single();
  }
}
