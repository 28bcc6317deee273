package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.board.Board;
import com.wayledger.board.BoardForm;
import com.wayledger.board.BoardService;
import com.wayledger.board.Circuit;
import com.wayledger.board.CircuitForm;
import com.wayledger.board.LoadForm;
import com.wayledger.board.ScheduleService;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.TripCurve;
import com.wayledger.site.Site;
import com.wayledger.site.SiteForm;
import com.wayledger.site.SiteService;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.UUID;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.RequestPostProcessor;

/**
 * The exchange pages on the whole application (H2): export, upload → mapping → preview → import,
 * and who may do what.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class ExchangeIntegrationTests {

  static final RequestPostProcessor EDITOR = user("ed").roles("EDITOR");
  static final RequestPostProcessor VIEWER = user("vi").roles("VIEWER");

  @Autowired MockMvc mvc;
  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired ScheduleService schedule;
  @Autowired ExportReader reader;

  Site site;
  Board source;
  Board target;

  static BoardForm board(String reference) {
    return new BoardForm(
        reference,
        "Plant room",
        3,
        12,
        100.0,
        DeviceKind.MCCB,
        null,
        63.0,
        3,
        10.0,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        10.0,
        1.0,
        null,
        null,
        null,
        null);
  }

  @BeforeEach
  void boards() {
    site =
        sites.create(
            new SiteForm(
                "Exchange " + UUID.randomUUID(),
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
    source = boards.create(site.getId(), board("DB-A"));
    target = boards.create(site.getId(), board("DB-B"));
    for (BoardEntry fixture : List.of(ExchangeFixtures.shop().get(1))) {
      for (CircuitEntry entry : fixture.circuits()) {
        Circuit circuit = schedule.addCircuit(source.getId(), entry.circuit());
        for (LoadForm load : entry.loads()) {
          schedule.addLoad(circuit.getId(), load);
        }
      }
    }
    CircuitForm oven =
        ExchangeFixtures.circuit(
            3, PhasePosition.THREE_POLE, "-Oven", DeviceKind.MCB, TripCurve.C, 20, null, 4.0, 12.0);
    Circuit circuit = schedule.addCircuit(source.getId(), oven);
    schedule.addLoad(
        circuit.getId(),
        ExchangeFixtures.load("Oven", LoadCategory.COOKING, 1, 7500, RatingUnit.W, 1.0));
    schedule.addLoad(
        circuit.getId(),
        ExchangeFixtures.load("@Grill", LoadCategory.COOKING, 1, 2000, RatingUnit.W, 1.0));
  }

  private static List<CircuitEntry> comparable(ExportData data) {
    return data.boards().get(0).circuits().stream()
        .map(e -> new CircuitEntry(null, withoutVersion(e.circuit()), e.loads()))
        .toList();
  }

  private static CircuitForm withoutVersion(CircuitForm c) {
    return new CircuitForm(
        c.wayNumber(),
        c.position(),
        c.description(),
        c.status(),
        c.lockedForBalancing(),
        c.deviceKind(),
        c.deviceCurve(),
        c.deviceRatingAmps(),
        c.devicePoles(),
        c.deviceBreakingCapacityKiloAmps(),
        c.deviceResidualMilliAmps(),
        c.deviceRcdType(),
        c.cableLineCsa(),
        c.cableCpcCsa(),
        c.cableMaterial(),
        c.cableInsulation(),
        c.cableLengthMetres(),
        c.cableInstallationMethod(),
        c.cableAmbientCelsius(),
        c.cableGroupedCircuits(),
        c.cableThermalInsulationMm(),
        c.measuredLoopImpedanceOhms(),
        null,
        null,
        null,
        null,
        null,
        null,
        null);
  }

  private String upload(byte[] bytes, String name, String expectedStep) throws Exception {
    String location =
        mvc.perform(
                multipart("/boards/{id}/import", target.getId())
                    .file(new MockMultipartFile("file", name, "application/octet-stream", bytes))
                    .with(EDITOR)
                    .with(csrf()))
            .andExpect(status().is3xxRedirection())
            .andReturn()
            .getResponse()
            .getRedirectedUrl();
    assertThat(location).as("next step after upload").endsWith("/" + expectedStep);
    return location;
  }

  @Test
  void exportedWorkbookImportedIntoAnEmptyBoardGivesTheSameSchedule() throws Exception {
    byte[] xlsx =
        mvc.perform(get("/boards/{id}/export.xlsx", source.getId()).with(VIEWER))
            .andExpect(status().isOk())
            .andExpect(header().string("Content-Type", ExportController.XLSX))
            .andExpect(
                header()
                    .string("Content-Disposition", org.hamcrest.Matchers.containsString(".xlsx")))
            .andReturn()
            .getResponse()
            .getContentAsByteArray();
    String preview = upload(xlsx, "db-a.xlsx", "preview");
    mvc.perform(get(preview).with(EDITOR))
        .andExpect(status().isOk())
        .andExpect(content().string(org.hamcrest.Matchers.containsString("Wayledger export")));
    String token = preview.split("/")[4];
    mvc.perform(
            post("/boards/{id}/import/{t}", target.getId(), token)
                .param("mode", "all")
                .with(EDITOR)
                .with(csrf()))
        .andExpect(status().is3xxRedirection())
        .andExpect(header().string("Location", "/boards/" + target.getId()));
    assertThat(comparable(reader.board(target.getId())))
        .isEqualTo(comparable(reader.board(source.getId())));
  }

  @Test
  void exportedCsvImportedIntoAnEmptyBoardGivesTheSameSchedule() throws Exception {
    byte[] csv =
        mvc.perform(get("/boards/{id}/export.csv", source.getId()).with(VIEWER))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsByteArray();
    assertThat(new String(csv, StandardCharsets.UTF_8))
        .as("formula-like text quoted")
        .contains("'-Oven")
        .contains("'@Grill");
    String preview = upload(csv, "db-a.csv", "preview");
    String token = preview.split("/")[4];
    mvc.perform(
            post("/boards/{id}/import/{t}", target.getId(), token)
                .param("mode", "all")
                .with(EDITOR)
                .with(csrf()))
        .andExpect(status().is3xxRedirection());
    assertThat(comparable(reader.board(target.getId())))
        .isEqualTo(comparable(reader.board(source.getId())));
  }

  @Test
  void foreignSheetGoesThroughMappingAndPreviewAndNothingIsStoredWhileRowsAreInvalid()
      throws Exception {
    String csv =
        "Cct,Phase,Description,Protection,Load kW\n1,L1,Lights,B6,0.5\n2,L2,Sockets,X99,2\n3,L3,Heater,C16,3\n";
    String mapping = upload(csv.getBytes(StandardCharsets.UTF_8), "foreign.csv", "mapping");
    mvc.perform(get(mapping).with(EDITOR))
        .andExpect(status().isOk())
        .andExpect(content().string(org.hamcrest.Matchers.containsString("name=\"column3\"")));
    String token = mapping.split("/")[4];
    mvc.perform(
            post(mapping)
                .with(EDITOR)
                .with(csrf())
                .param("sheet", "0")
                .param("column0", "WAY")
                .param("column1", "LINE")
                .param("column2", "CIRCUIT")
                .param("column3", "DEVICE_SUMMARY")
                .param("column4", "LOAD_KILOWATTS"))
        .andExpect(status().is3xxRedirection());
    mvc.perform(get("/boards/{id}/import/{t}/preview", target.getId(), token).with(EDITOR))
        .andExpect(status().isOk())
        .andExpect(
            content().string(org.hamcrest.Matchers.containsString("does not read as a device")));
    mvc.perform(
            post("/boards/{id}/import/{t}", target.getId(), token)
                .param("mode", "all")
                .with(EDITOR)
                .with(csrf()))
        .andExpect(status().isUnprocessableContent());
    assertThat(reader.board(target.getId()).boards().get(0).circuits())
        .as("nothing stored")
        .isEmpty();
    mvc.perform(
            post("/boards/{id}/import/{t}", target.getId(), token)
                .param("mode", "valid")
                .with(EDITOR)
                .with(csrf()))
        .andExpect(status().is3xxRedirection());
    assertThat(reader.board(target.getId()).boards().get(0).circuits())
        .extracting(e -> e.circuit().description())
        .containsExactly("Lights", "Heater");
  }

  @Test
  void notASpreadsheetGetsAMessageAnd422() throws Exception {
    mvc.perform(
            multipart("/boards/{id}/import", target.getId())
                .file(
                    new MockMultipartFile(
                        "file",
                        "photo.xlsx",
                        "image/png",
                        new byte[] {(byte) 0x89, 'P', 'N', 'G', 0, 0, 0, 0}))
                .with(EDITOR)
                .with(csrf()))
        .andExpect(status().isUnprocessableContent())
        .andExpect(
            content()
                .string(org.hamcrest.Matchers.containsString("not a spreadsheet we can read")));
  }

  @Test
  void viewerMayExportButNotImport() throws Exception {
    mvc.perform(get("/sites/{id}/export.xlsx", site.getId()).with(VIEWER))
        .andExpect(status().isOk());
    mvc.perform(get("/boards/{id}/door-chart", source.getId()).with(VIEWER))
        .andExpect(status().isOk());
    mvc.perform(get("/boards/{id}/import", target.getId()).with(VIEWER))
        .andExpect(status().isForbidden());
    mvc.perform(
            get(
                    "/boards/{id}/import/{t}/preview",
                    target.getId(),
                    "0123456789abcdef0123456789abcdef")
                .with(VIEWER))
        .andExpect(status().isForbidden());
    mvc.perform(
            multipart("/boards/{id}/import", target.getId())
                .file(
                    new MockMultipartFile(
                        "file", "a.csv", "text/csv", "Way\n1\n".getBytes(StandardCharsets.UTF_8)))
                .with(VIEWER)
                .with(csrf()))
        .andExpect(status().isForbidden());
    mvc.perform(get("/boards/{id}/import", target.getId()).with(EDITOR)).andExpect(status().isOk());
  }

  @Test
  void anotherUsersUploadTokenIsNotFound() throws Exception {
    String preview =
        upload(
            mvc.perform(get("/boards/{id}/export.csv", source.getId()).with(VIEWER))
                .andReturn()
                .getResponse()
                .getContentAsByteArray(),
            "a.csv",
            "preview");
    mvc.perform(
            get(preview)
                .with(SecurityMockMvcRequestPostProcessors.user("someone-else").roles("EDITOR")))
        .andExpect(status().isNotFound());
  }

  @Test
  void doorChartShowsWaysDevicesSiteAndCaution() throws Exception {
    mvc.perform(get("/boards/{id}/door-chart", source.getId()).with(VIEWER))
        .andExpect(status().isOk())
        .andExpect(content().string(org.hamcrest.Matchers.containsString("Store heaters")))
        .andExpect(content().string(org.hamcrest.Matchers.containsString("RCBO B20")))
        .andExpect(content().string(org.hamcrest.Matchers.containsString(site.getName())))
        .andExpect(
            content().string(org.hamcrest.Matchers.containsString("assist a competent person")))
        // the chart's own style sheet, under its content-hashed URL
        .andExpect(
            content()
                .string(
                    org.hamcrest.Matchers.matchesPattern(
                        "(?s).*/css/door-chart-[0-9a-f]{32}\\.css.*")));
    // the A4 print rule lives in the chart's style sheet, not in the page
    mvc.perform(get("/css/door-chart.css").with(VIEWER))
        .andExpect(status().isOk())
        .andExpect(content().string(org.hamcrest.Matchers.containsString("size: A4 portrait")));
  }
}
