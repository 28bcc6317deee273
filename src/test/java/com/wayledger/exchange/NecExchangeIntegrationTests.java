package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.board.AnalysisService;
import com.wayledger.board.SiteAnalysis;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import java.io.ByteArrayInputStream;
import java.util.UUID;
import org.apache.poi.ss.usermodel.DataFormatter;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.hamcrest.Matchers;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.RequestPostProcessor;

/**
 * The NEC demo's panels go out to a workbook and come back into empty panels with the same
 * analysis: split-phase lines A and B, two-pole (240 V) circuits and the dwelling inputs ("Dwelling
 * load" sheet). The figures compared are the stored panel's own, so nothing is computed here.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles({"test", "demo"})
class NecExchangeIntegrationTests {

  private static final RequestPostProcessor EDITOR = user("ed").roles("EDITOR");

  @Autowired MockMvc mvc;
  @Autowired SiteService sites;
  @Autowired AnalysisService analysis;
  @Autowired JdbcClient jdbc;

  Site site;

  @BeforeEach
  void necDemo() {
    site =
        sites.all().stream()
            .filter(s -> s.getName().equals("Wrenfield Court Apartments"))
            .findFirst()
            .orElseThrow();
  }

  @Test
  void workbookWritesTheRuleSetSupplySystemAndConnections() throws Exception {
    long common = boardId("CP");
    try (XSSFWorkbook workbook = new XSSFWorkbook(new ByteArrayInputStream(export(common)))) {
      Sheet sheet = boardSheet(workbook);
      DataFormatter text = new DataFormatter();
      String facts = rowText(sheet.getRow(1), text);
      // the panel's own system (two poles of the 208Y/120 V house panel), not the site's
      assertThat(facts).contains("NEC").contains("120/208 V single-phase three-wire");
      Row header = sheet.getRow(3);
      int line = column(header, "Line", text);
      int connection = column(header, "Connection", text);
      boolean twoPole = false;
      for (int r = 4; r <= sheet.getLastRowNum(); r++) {
        Row row = sheet.getRow(r);
        if (row == null) {
          continue;
        }
        String lineCell = text.formatCellValue(row.getCell(line));
        assertThat(lineCell)
            .as("row %d: a panelboard's lines are A and B, not L1/L2", r + 1)
            .doesNotStartWith("L1")
            .doesNotStartWith("L2");
        if ("A-B".equals(lineCell)) {
          assertThat(text.formatCellValue(row.getCell(connection))).isEqualTo("L-L");
          twoPole = true;
        }
      }
      assertThat(twoPole).as("a two-pole row").isTrue();
    }
  }

  @Test
  void commonAreaPanelRoundTripsIntoAnEmptyPanel() throws Exception {
    long common = boardId("CP");
    long copy = emptyPanel("CP copy " + UUID.randomUUID().toString().substring(0, 6), "none");

    importInto(copy, export(common));

    assertSameDemand(common, copy);
  }

  @Test
  void theConduitOfEachCircuitRoundTripsThroughTheWorkbook() throws Exception {
    long first = emptyPanel("CP conduit " + UUID.randomUUID().toString().substring(0, 6), "none");
    importInto(first, export(boardId("CP")));
    // setup on the copy only (the demo keeps its own): steel conduit on every circuit
    jdbc.sql("UPDATE circuit SET cable_conduit = 'STEEL' WHERE board_id = ? AND status = 'IN_USE'")
        .param(first)
        .update();
    byte[] workbook = export(first);
    try (XSSFWorkbook book = new XSSFWorkbook(new ByteArrayInputStream(workbook))) {
      Sheet sheet = boardSheet(book);
      DataFormatter text = new DataFormatter();
      int conduit = column(sheet.getRow(3), "Conduit", text);
      assertThat(text.formatCellValue(sheet.getRow(4).getCell(conduit))).isEqualTo("Steel");
    }
    long second = emptyPanel("CP conduit " + UUID.randomUUID().toString().substring(0, 6), "none");
    importInto(second, workbook);
    assertThat(
            jdbc.sql(
                    "SELECT DISTINCT cable_conduit FROM circuit WHERE board_id = ?"
                        + " AND status = 'IN_USE'")
                .param(second)
                .query(String.class)
                .list())
        .containsExactly("STEEL");
  }

  @Test
  void apartmentPanelRoundTripsWithItsDwellingInputs() throws Exception {
    long apartment = boardId("APT-1");
    long copy = emptyPanel("APT-1 copy " + UUID.randomUUID().toString().substring(0, 6), null);

    String preview = importInto(copy, export(apartment));

    assertThat(preview)
        .contains("Dwelling inputs in the file (exported from APT-1)")
        .contains("1,150 ft²");
    assertThat(
            jdbc.sql(
                    "SELECT floor_area_square_feet || '|' || small_appliance_circuits || '|'"
                        + " || laundry_circuits FROM board_dwelling WHERE board_id = ?")
                .param(copy)
                .query(String.class)
                .single())
        .as("the apartment's inputs stored on the copy")
        .isEqualTo(
            jdbc.sql(
                    "SELECT floor_area_square_feet || '|' || small_appliance_circuits || '|'"
                        + " || laundry_circuits FROM board_dwelling WHERE board_id = ?")
                .param(apartment)
                .query(String.class)
                .single());
    assertSameDemand(apartment, copy);
    assertThat(faultInterrupters(copy))
        .as("the demo apartment's GFCI/AFCI breakers come back with their panel")
        .isNotEmpty()
        .isEqualTo(faultInterrupters(apartment));
    SiteAnalysis results = analysis.ofSite(site.getId());
    assertThat(results.dwellingWorksheets(copy).get(0).resultVoltAmperes())
        .as("standard method of the copy")
        .isCloseTo(results.dwellingWorksheets(apartment).get(0).resultVoltAmperes(), within(1e-6));
    assertThat(
            results.spec().boards().stream()
                .filter(b -> b.id() == copy)
                .flatMap(b -> b.circuits().stream())
                .filter(c -> c.description().equals("Water heater"))
                .findFirst()
                .orElseThrow()
                .position())
        .isEqualTo(PhasePosition.L1_L2);
  }

  @Test
  void dwellingInputsSetThroughTheApiAreRefusedBesideTheBadField() throws Exception {
    long copy = emptyPanel("API " + UUID.randomUUID().toString().substring(0, 6), null);

    mvc.perform(
            put("/api/boards/{id}/dwelling", copy)
                .with(EDITOR)
                .with(csrf())
                .contentType(MediaType.APPLICATION_JSON)
                .content(
                    """
                    {"floorArea": -3, "areaUnit": "FT2", "smallApplianceCircuits": 2,
                     "laundryCircuits": 1, "addition": "NONE"}
                    """))
        .andExpect(status().is4xxClientError())
        .andExpect(jsonPath("$.fields[*].field", Matchers.hasItem("floorArea")));
    assertThat(
            jdbc.sql("SELECT COUNT(*) FROM board_dwelling WHERE board_id = ?")
                .param(copy)
                .query(Long.class)
                .single())
        .isZero();
  }

  @Test
  void apiTakesALineToLineCircuitAndRefusesAPositionThePanelHasNot() throws Exception {
    long panel = emptyPanel("API circuits " + UUID.randomUUID().toString().substring(0, 6), null);
    String twoPole =
        """
        {"wayNumber": 1, "position": "%s", "description": "Water heater", "status": "IN_USE",
         "deviceKind": "MCB", "deviceCurve": "C", "deviceRatingAmps": 30, "devicePoles": 2,
         "deviceBreakingCapacityKiloAmps": 10, "loadDescription": "Water heater",
         "loadCategory": "WATER_HEATING_STORAGE", "loadQuantity": 1, "loadRatingValue": 4500,
         "loadRatingUnit": "W", "loadPowerFactor": 1, "location": "INDOORS"}
        """;

    String id =
        mvc.perform(
                post("/api/boards/{id}/circuits", panel)
                    .with(EDITOR)
                    .with(csrf())
                    .contentType(MediaType.APPLICATION_JSON)
                    .content(twoPole.formatted("L1_L2")))
            .andExpect(status().isCreated())
            .andReturn()
            .getResponse()
            .getContentAsString();
    mvc.perform(get("/api/circuits/{id}", id.strip()).with(EDITOR))
        .andExpect(status().isOk())
        .andExpect(jsonPath("$..position", Matchers.hasItem("L1_L2")));
    // a single-phase three-wire panel has lines A and B only: B–C is not one of its positions
    mvc.perform(
            post("/api/boards/{id}/circuits", panel)
                .with(EDITOR)
                .with(csrf())
                .contentType(MediaType.APPLICATION_JSON)
                .content(
                    twoPole.formatted("L2_L3").replace("\"wayNumber\": 1", "\"wayNumber\": 2")))
        .andExpect(status().is4xxClientError());
    assertThat(
            jdbc.sql("SELECT COUNT(*) FROM circuit WHERE board_id = ?")
                .param(panel)
                .query(Long.class)
                .single())
        .as("only the two-pole A–B circuit stored")
        .isEqualTo(1L);
  }

  @Test
  void faultInterrupterAndMotorHorsepowerComeBackWithTheirPanel() throws Exception {
    String suffix = UUID.randomUUID().toString().substring(0, 6);
    long source = emptyPanel("HP source " + suffix, "none");
    String circuit =
        mvc.perform(
                post("/api/boards/{id}/circuits", source)
                    .with(EDITOR)
                    .with(csrf())
                    .contentType(MediaType.APPLICATION_JSON)
                    .content(
                        """
                        {"wayNumber": 1, "position": "L1_L2", "description": "Well pump",
                         "status": "IN_USE", "deviceKind": "MCB", "deviceCurve": "C",
                         "deviceRatingAmps": 20, "devicePoles": 2,
                         "deviceBreakingCapacityKiloAmps": 10, "deviceFaultInterrupter": "GFCI",
                         "location": "OUTDOORS"}
                        """))
            .andExpect(status().isCreated())
            .andReturn()
            .getResponse()
            .getContentAsString()
            .strip();
    mvc.perform(
            post("/api/circuits/{id}/loads", circuit)
                .with(EDITOR)
                .with(csrf())
                .contentType(MediaType.APPLICATION_JSON)
                .content(
                    """
                    {"description": "Pump motor", "category": "MOTOR", "quantity": 1,
                     "ratingValue": 9.8, "ratingUnit": "A", "powerFactor": 0.8,
                     "continuous": false, "motorHorsepower": 1.5}
                    """))
        .andExpect(status().is2xxSuccessful());
    long copy = emptyPanel("HP copy " + suffix, "none");

    byte[] workbook = export(source);
    try (XSSFWorkbook book = new XSSFWorkbook(new ByteArrayInputStream(workbook))) {
      Sheet sheet = boardSheet(book);
      DataFormatter text = new DataFormatter();
      Row header = sheet.getRow(3);
      Row first = sheet.getRow(4);
      assertThat(text.formatCellValue(first.getCell(column(header, "Fault interrupter", text))))
          .as("the breaker's function in words")
          .isNotBlank()
          .doesNotContain("GFCI_")
          .containsIgnoringCase("GFCI");
      assertThat(text.formatCellValue(first.getCell(column(header, "Motor hp", text))))
          .isEqualTo("1.5");
    }
    importInto(copy, workbook);

    assertThat(
            jdbc.sql(
                    "SELECT c.device_fault_interrupter || '|' || l.motor_horsepower FROM circuit c"
                        + " JOIN load_item l ON l.circuit_id = c.id WHERE c.board_id = ?")
                .param(copy)
                .query(String.class)
                .single())
        .as("GFCI breaker and 1.5 hp motor stored on the copy")
        .isEqualTo("GFCI|1.5");
    assertSameDemand(source, copy);
  }

  @Test
  void csvCarriesTheRuleSetAndSupplySystemAndRoundTripsIntoAnEmptyPanel() throws Exception {
    long common = boardId("CP");
    byte[] csv = exportCsv(common);
    String text = new String(csv, java.nio.charset.StandardCharsets.UTF_8);
    assertThat(text)
        .as("the line after the schedule names what it was checked against, as the workbook does")
        .contains(
            "\"Rule set\",\""
                + com.wayledger.engine.rules.RuleSets.of("NEC").title()
                + "\",\"Supply system\",\"120/208 V single-phase three-wire");
    long copy = emptyPanel("CP csv " + UUID.randomUUID().toString().substring(0, 6), "none");

    importInto(copy, csv, "panel.csv");

    assertSameDemand(common, copy);
  }

  @Test
  void aCsvOfAnotherRuleSetIsRefusedNamingBothAndNothingIsStored() throws Exception {
    refusedNamingBoth("board.csv", this::exportCsv);
  }

  @Test
  void aWorkbookOfAnotherRuleSetIsRefusedNamingBothAndNothingIsStored() throws Exception {
    refusedNamingBoth("board.xlsx", this::export);
  }

  private interface Exporter {
    byte[] of(long boardId) throws Exception;
  }

  private void refusedNamingBoth(String fileName, Exporter exporter) throws Exception {
    long iecBoard =
        jdbc.sql(
                "SELECT b.id FROM board b JOIN site s ON s.id = b.site_id WHERE s.rule_set = 'IEC'"
                    + " AND EXISTS (SELECT 1 FROM circuit c WHERE c.board_id = b.id)"
                    + " ORDER BY b.id LIMIT 1")
            .query(Long.class)
            .single();
    long panel = emptyPanel("Refuses IEC " + UUID.randomUUID().toString().substring(0, 6), null);
    String location =
        mvc.perform(
                multipart("/boards/{id}/import", panel)
                    .file(
                        new MockMultipartFile(
                            "file", fileName, "application/octet-stream", exporter.of(iecBoard)))
                    .with(EDITOR)
                    .with(csrf()))
            .andExpect(status().is3xxRedirection())
            .andReturn()
            .getResponse()
            .getRedirectedUrl();
    String token = location.split("/")[4];

    String preview =
        mvc.perform(get(location).with(EDITOR))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    String refused =
        mvc.perform(
                post("/boards/{id}/import/{t}", panel, token)
                    .param("mode", "valid")
                    .param("reason", "wrong file")
                    .with(EDITOR)
                    .with(csrf()))
            .andExpect(status().isUnprocessableContent())
            .andReturn()
            .getResponse()
            .getContentAsString();

    String iec = com.wayledger.engine.rules.RuleSets.IEC.title();
    String nec = com.wayledger.engine.rules.RuleSets.of("NEC").title();
    for (String page : new String[] {preview, refused}) {
      assertThat(org.springframework.web.util.HtmlUtils.htmlUnescape(page))
          .as("the refusal names the file's rule set and the board's")
          .contains("exported under " + iec)
          .contains("checked against " + nec);
    }
    assertThat(
            jdbc.sql("SELECT COUNT(*) FROM circuit WHERE board_id = ?")
                .param(panel)
                .query(Long.class)
                .single())
        .as("nothing stored")
        .isZero();
  }

  private void assertSameDemand(long original, long copy) {
    SiteAnalysis results = analysis.ofSite(site.getId());
    BoardDemand before = results.demand().board(original);
    BoardDemand after = results.demand().board(copy);
    assertThat(after.demandWatts()).as("demand W").isCloseTo(before.demandWatts(), within(1e-6));
    assertThat(after.connectedWatts())
        .as("connected W")
        .isCloseTo(before.connectedWatts(), within(1e-6));
    for (Phase line : new Phase[] {Phase.L1, Phase.L2}) {
      assertThat(after.onPhase(line).currentAmps())
          .as("line %s", line)
          .isCloseTo(before.onPhase(line).currentAmps(), within(1e-6));
    }
    assertThat(after.neutralCurrentAmps())
        .as("neutral")
        .isCloseTo(before.neutralCurrentAmps(), within(1e-6));
  }

  /** Each space's breaker function ("3:GFCI"), in space order; spaces without one left out. */
  private java.util.List<String> faultInterrupters(long boardId) {
    return jdbc.sql(
            "SELECT way_number || ':' || device_fault_interrupter FROM circuit WHERE board_id = ?"
                + " AND device_fault_interrupter IS NOT NULL ORDER BY way_number")
        .param(boardId)
        .query(String.class)
        .list();
  }

  private long boardId(String reference) {
    return jdbc.sql("SELECT id FROM board WHERE site_id = ? AND reference = ?")
        .param(site.getId())
        .param(reference)
        .query(Long.class)
        .single();
  }

  private long emptyPanel(String reference, String method) throws Exception {
    var request =
        post("/sites/{id}/boards", site.getId())
            .with(EDITOR)
            .with(csrf())
            .param("reference", reference)
            .param("phases", "1")
            // the demo's apartment and common-area panels are 120/208 V single-phase three-wire
            .param("supplySystem", "SINGLE_PHASE_120_208")
            .param("wayCount", "30") // as many spaces as the demo's apartment panels
            .param("busbarRatingAmps", "200")
            .param("incomerKind", "MCCB")
            .param("incomerRatingAmps", "200")
            .param("incomerPoles", "2")
            .param("incomerBreakingCapacityKiloAmps", "22")
            .param("unbalanceLimitPercent", "10")
            .param("coincidenceFactor", "1");
    if (method != null) {
      request.param("diversityMethod", method);
    }
    mvc.perform(request).andExpect(status().is3xxRedirection());
    return boardId(reference);
  }

  private byte[] export(long boardId) throws Exception {
    return mvc.perform(get("/boards/{id}/export.xlsx", boardId).with(EDITOR))
        .andExpect(status().isOk())
        .andReturn()
        .getResponse()
        .getContentAsByteArray();
  }

  private byte[] exportCsv(long boardId) throws Exception {
    return mvc.perform(get("/boards/{id}/export.csv", boardId).with(EDITOR))
        .andExpect(status().isOk())
        .andReturn()
        .getResponse()
        .getContentAsByteArray();
  }

  private String importInto(long boardId, byte[] workbook) throws Exception {
    return importInto(boardId, workbook, "panel.xlsx");
  }

  /** Uploads, previews and imports a workbook or CSV file; returns the preview page. */
  private String importInto(long boardId, byte[] workbook, String fileName) throws Exception {
    String location =
        mvc.perform(
                multipart("/boards/{id}/import", boardId)
                    .file(
                        new MockMultipartFile(
                            "file", fileName, "application/octet-stream", workbook))
                    .with(EDITOR)
                    .with(csrf()))
            .andExpect(status().is3xxRedirection())
            .andReturn()
            .getResponse()
            .getRedirectedUrl();
    assertThat(location).as("our own export goes straight to the preview").endsWith("/preview");
    String token = location.split("/")[4];
    String preview =
        mvc.perform(get(location).with(EDITOR))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    mvc.perform(
            post("/boards/{id}/import/{t}", boardId, token)
                .param("mode", "all")
                .param("reason", "round trip")
                .with(EDITOR)
                .with(csrf()))
        .andExpect(status().is3xxRedirection());
    return preview;
  }

  private static Sheet boardSheet(XSSFWorkbook workbook) {
    for (int i = 0; i < workbook.getNumberOfSheets(); i++) {
      if (workbook.getSheetName(i).startsWith("Board ")) {
        return workbook.getSheetAt(i);
      }
    }
    throw new AssertionError("no board sheet");
  }

  private static String rowText(Row row, DataFormatter text) {
    StringBuilder all = new StringBuilder();
    row.forEach(cell -> all.append(text.formatCellValue(cell)).append(' '));
    return all.toString();
  }

  private static int column(Row header, String name, DataFormatter text) {
    for (var cell : header) {
      if (name.equals(text.formatCellValue(cell))) {
        return cell.getColumnIndex();
      }
    }
    throw new AssertionError("no column " + name);
  }
}
