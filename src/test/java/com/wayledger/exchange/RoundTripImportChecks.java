package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.board.Circuit;
import com.wayledger.board.LoadForm;
import com.wayledger.board.LoadItem;
import com.wayledger.board.ScheduleService;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.TripCurve;
import com.wayledger.site.SiteForm;
import com.wayledger.site.SiteService;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.UUID;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.RequestPostProcessor;

/**
 * An export edited in a spreadsheet comes back into the same board: the preview says, circuit by
 * circuit, what the import adds, changes (field by field), leaves unchanged, removes or keeps;
 * applying stores all of it as one change-log entry with the reason; a circuit changed on the board
 * since the export is shown as a conflict and nothing is stored. Run on H2 and on PostgreSQL.
 */
abstract class RoundTripImportChecks {

  static final RequestPostProcessor EDITOR = user("ed").roles("EDITOR");

  @Autowired MockMvc mvc;
  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired ScheduleService schedule;
  @Autowired JdbcClient jdbc;

  Board board;
  Circuit lights;
  Circuit oven;
  Circuit heater;

  @BeforeEach
  void board() {
    var site =
        sites.create(
            new SiteForm(
                "Round trip " + UUID.randomUUID(),
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
                null));
    board = boards.create(site.getId(), ExchangeIntegrationTests.board("DB-R"));
    lights =
        schedule.addCircuit(
            board.getId(),
            ExchangeFixtures.circuit(
                1, PhasePosition.L1, "Lights", DeviceKind.MCB, TripCurve.B, 6, null, 1.5, 20.0));
    schedule.addLoad(
        lights.getId(),
        ExchangeFixtures.load("Lamps", LoadCategory.LIGHTING, 10, 60, RatingUnit.W, 0.9));
    oven =
        schedule.addCircuit(
            board.getId(),
            ExchangeFixtures.circuit(
                3,
                PhasePosition.THREE_POLE,
                "Oven",
                DeviceKind.MCB,
                TripCurve.C,
                20,
                null,
                4.0,
                12.0));
    schedule.addLoad(
        oven.getId(),
        ExchangeFixtures.load("Oven", LoadCategory.COOKING, 1, 7500, RatingUnit.W, 1.0));
    schedule.addLoad(
        oven.getId(),
        ExchangeFixtures.load("Grill", LoadCategory.COOKING, 1, 2000, RatingUnit.W, 1.0));
    heater =
        schedule.addCircuit(
            board.getId(),
            ExchangeFixtures.circuit(
                2, PhasePosition.L2, "Heater", DeviceKind.MCB, TripCurve.B, 16, null, 2.5, 15.0));
    schedule.addLoad(
        heater.getId(),
        ExchangeFixtures.load(
            "Panel heater", LoadCategory.SPACE_HEATING, 1, 2000, RatingUnit.W, 1));
  }

  @Test
  void exportEditedInOneCellShowsExactlyThatChangeAndApplyingStoresItAsOneLogEntry()
      throws Exception {
    byte[] edited = editXlsx(exportXlsx(), "Grill", "Rating", 2500);
    String token = upload(edited, "db-r.xlsx");
    String page = preview(token, false);
    assertThat(kinds(page))
        .as("one circuit changed, the others unchanged")
        .containsExactly("UNCHANGED", "UNCHANGED", "CHANGED");
    assertThat(changes(page))
        .as("the one change, stored → file")
        .containsExactly("RATING:2000→2500");
    long entriesBefore = logEntries();

    mvc.perform(
            post("/boards/{id}/import/{t}", board.getId(), token)
                .param("mode", "all")
                .param("reason", "WO-77 grill upgraded")
                .with(EDITOR)
                .with(csrf()))
        .andExpect(status().is3xxRedirection())
        .andExpect(header().string("Location", "/boards/" + board.getId()));

    assertThat(schedule.loadsOf(oven.getId()))
        .extracting(LoadItem::getRatingValue)
        .as("the grill's new rating stored, the oven's kept")
        .containsExactly(7500.0, 2500.0);
    assertThat(logEntries())
        .as("one change-log entry for the whole import")
        .isEqualTo(entriesBefore + 1);
    assertThat(
            jdbc.sql(
                    "SELECT kind || '|' || reason FROM change_log WHERE board_id = ? ORDER BY id DESC LIMIT 1")
                .param(board.getId())
                .query(String.class)
                .single())
        .isEqualTo("IMPORT|WO-77 grill upgraded");
  }

  @Test
  void unchangedExportShowsEveryCircuitUnchangedAndApplyingRecordsNothing() throws Exception {
    String token = upload(exportXlsx(), "db-r.xlsx");
    String page = preview(token, false);
    assertThat(kinds(page)).containsExactly("UNCHANGED", "UNCHANGED", "UNCHANGED");
    assertThat(page).as("nothing to change said").contains("id=\"import-nothing\"");
    long entriesBefore = logEntries();
    String answer =
        mvc.perform(
                post("/boards/{id}/import/{t}", board.getId(), token)
                    .param("mode", "all")
                    .with(EDITOR)
                    .with(csrf()))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(answer).contains("id=\"import-nothing\"");
    assertThat(logEntries()).as("nothing recorded").isEqualTo(entriesBefore);
  }

  @Test
  void circuitChangedSinceTheExportIsAConflictAndNothingIsStored() throws Exception {
    byte[] edited = editXlsx(exportXlsx(), "Panel heater", "Rating", 3000);
    // someone edits the heater's load on the board after the export
    long loadId = schedule.loadsOf(heater.getId()).get(0).getId();
    schedule.updateLoad(
        loadId,
        new LoadForm(
            "Panel heater",
            LoadCategory.SPACE_HEATING,
            1,
            2200.0,
            RatingUnit.W,
            1.0,
            null,
            null,
            false),
        "meter reading");
    String token = upload(edited, "db-r.xlsx");
    String page = preview(token, false);
    assertThat(kinds(page)).containsExactly("UNCHANGED", "CONFLICT", "UNCHANGED");
    assertThat(page).contains("id=\"import-conflicts\"").doesNotContain("id=\"import-all\"");
    long entriesBefore = logEntries();

    mvc.perform(
            post("/boards/{id}/import/{t}", board.getId(), token)
                .param("mode", "all")
                .with(EDITOR)
                .with(csrf()))
        .andExpect(status().isConflict());

    assertThat(schedule.loadsOf(heater.getId()))
        .extracting(LoadItem::getRatingValue)
        .as("the edit made since the export is not overwritten")
        .containsExactly(2200.0);
    assertThat(logEntries()).as("nothing recorded").isEqualTo(entriesBefore);
  }

  @Test
  void circuitMissingFromTheFileIsKeptUnlessTheUserAsksToRemoveIt() throws Exception {
    String csv = new String(exportCsv(), StandardCharsets.UTF_8);
    List<String> lines = new ArrayList<>(csv.lines().toList());
    lines.removeIf(line -> line.contains("\"Heater\""));
    byte[] withoutHeater = (String.join("\n", lines) + "\n").getBytes(StandardCharsets.UTF_8);

    String kept = upload(withoutHeater, "db-r.csv");
    String page = preview(kept, false);
    assertThat(kinds(page)).containsExactly("UNCHANGED", "UNCHANGED", "KEPT");
    assertThat(page).contains("id=\"import-nothing\"");

    String removing = preview(kept, true);
    assertThat(kinds(removing)).containsExactly("UNCHANGED", "UNCHANGED", "REMOVED");
    long entriesBefore = logEntries();
    mvc.perform(
            post("/boards/{id}/import/{t}", board.getId(), kept)
                .param("mode", "all")
                .param("remove", "true")
                .param("reason", "heater taken out")
                .with(EDITOR)
                .with(csrf()))
        .andExpect(status().is3xxRedirection());

    assertThat(
            jdbc.sql("SELECT COUNT(*) FROM circuit WHERE board_id = ?")
                .param(board.getId())
                .query(Long.class)
                .single())
        .as("the heater removed, the others kept")
        .isEqualTo(2L);
    assertThat(
            jdbc.sql("SELECT COUNT(*) FROM circuit WHERE id = ?")
                .param(heater.getId())
                .query(Long.class)
                .single())
        .isZero();
    assertThat(logEntries()).isEqualTo(entriesBefore + 1);
  }

  @Test
  void rowWithoutKeyIsMatchedByWayAndLineAndMovedCircuitByItsKey() throws Exception {
    String csv = new String(exportCsv(), StandardCharsets.UTF_8);
    // the lights move from way 1 to way 4 (the key keeps them the same circuit)
    String moved = csv.replaceFirst("\"1\",\"L1\",\"Lights\"", "\"4\",\"L1\",\"Lights\"");
    assertThat(moved).as("the edit applies").isNotEqualTo(csv);
    String token = upload(moved.getBytes(StandardCharsets.UTF_8), "db-r.csv");
    String page = preview(token, false);
    assertThat(kinds(page)).containsExactly("CHANGED", "UNCHANGED", "UNCHANGED");
    assertThat(changes(page)).containsExactly("WAY:1→4");
    mvc.perform(
            post("/boards/{id}/import/{t}", board.getId(), token)
                .param("mode", "all")
                .with(EDITOR)
                .with(csrf()))
        .andExpect(status().is3xxRedirection());
    assertThat(schedule.circuit(lights.getId()).getWayNumber()).isEqualTo(4);
  }

  // ------------------------------------------------------------------ helpers

  private long logEntries() {
    return jdbc.sql("SELECT COUNT(*) FROM change_log WHERE board_id = ?")
        .param(board.getId())
        .query(Long.class)
        .single();
  }

  private byte[] exportXlsx() throws Exception {
    return mvc.perform(get("/boards/{id}/export.xlsx", board.getId()).with(EDITOR))
        .andExpect(status().isOk())
        .andReturn()
        .getResponse()
        .getContentAsByteArray();
  }

  private byte[] exportCsv() throws Exception {
    return mvc.perform(get("/boards/{id}/export.csv", board.getId()).with(EDITOR))
        .andExpect(status().isOk())
        .andReturn()
        .getResponse()
        .getContentAsByteArray();
  }

  /** The workbook with one cell changed: the row whose Load cell reads {@code load}. */
  static byte[] editXlsx(byte[] xlsx, String load, String header, double value) throws Exception {
    try (XSSFWorkbook workbook = new XSSFWorkbook(new ByteArrayInputStream(xlsx))) {
      Sheet sheet = null;
      for (int i = 0; i < workbook.getNumberOfSheets(); i++) {
        if (workbook.getSheetName(i).startsWith("Board ")) {
          sheet = workbook.getSheetAt(i);
        }
      }
      assertThat(sheet).as("board sheet").isNotNull();
      Row head = sheet.getRow(3);
      int loadColumn = column(head, "Load");
      int edited = column(head, header);
      boolean done = false;
      for (int r = 4; r <= sheet.getLastRowNum() && !done; r++) {
        Row row = sheet.getRow(r);
        Cell cell = row == null ? null : row.getCell(loadColumn);
        if (cell != null && load.equals(cell.getStringCellValue())) {
          row.getCell(edited).setCellValue(value);
          done = true;
        }
      }
      assertThat(done).as("row of " + load + " found").isTrue();
      ByteArrayOutputStream out = new ByteArrayOutputStream();
      workbook.write(out);
      return out.toByteArray();
    }
  }

  private static int column(Row head, String header) {
    for (Cell cell : head) {
      if (header.equals(cell.getStringCellValue())) {
        return cell.getColumnIndex();
      }
    }
    throw new AssertionError("no column " + header);
  }

  private String upload(byte[] bytes, String name) throws Exception {
    String location =
        mvc.perform(
                multipart("/boards/{id}/import", board.getId())
                    .file(new MockMultipartFile("file", name, "application/octet-stream", bytes))
                    .with(EDITOR)
                    .with(csrf()))
            .andExpect(status().is3xxRedirection())
            .andReturn()
            .getResponse()
            .getRedirectedUrl();
    assertThat(location).as("our own export goes straight to the preview").endsWith("/preview");
    return location.split("/")[4];
  }

  private String preview(String token, boolean remove) throws Exception {
    return mvc.perform(
            get("/boards/{id}/import/{t}/preview", board.getId(), token)
                .param("remove", Boolean.toString(remove))
                .with(EDITOR))
        .andExpect(status().isOk())
        .andReturn()
        .getResponse()
        .getContentAsString();
  }

  /** The outcome of each circuit, in the order the preview lists them. */
  static List<String> kinds(String page) {
    List<String> kinds = new ArrayList<>();
    Matcher m = Pattern.compile("data-kind=\"([A-Z]+)\"").matcher(page);
    while (m.find()) {
      kinds.add(m.group(1));
    }
    return kinds;
  }

  /** Every change listed, as FIELD:before→after. */
  static List<String> changes(String page) {
    List<String> changes = new ArrayList<>();
    Matcher m =
        Pattern.compile(
                "data-field=\"([A-Z_]+)\".*?class=\"before\">([^<]*)</span>\\s*→\\s*<span class=\"after\">([^<]*)</span>",
                Pattern.DOTALL)
            .matcher(page);
    while (m.find()) {
      changes.add(m.group(1) + ":" + m.group(2) + "→" + m.group(3));
    }
    return changes;
  }
}
