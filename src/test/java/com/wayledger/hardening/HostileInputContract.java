package com.wayledger.hardening;

import static com.wayledger.hardening.Fixture.api;
import static com.wayledger.hardening.Fixture.pageEditor;
import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;

import com.wayledger.account.AccountService;
import java.nio.charset.StandardCharsets;
import java.util.Map;
import java.util.zip.ZipEntry;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

/**
 * Each cause of a server error found by probing, and the text rules, on one database (H2 and
 * PostgreSQL subclasses). Every refusal is a 4xx naming the field, and the stored data is
 * unchanged.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
abstract class HostileInputContract {

  @Autowired MockMvc mvc;
  @Autowired JdbcClient jdbc;
  @Autowired AccountService accounts;

  Fixture fixture;

  @BeforeEach
  void fixture() throws Exception {
    Fixture.ensureApiUser(accounts);
    fixture = new Fixture(mvc, jdbc);
  }

  private MvcResult perform(org.springframework.test.web.servlet.RequestBuilder request)
      throws Exception {
    return mvc.perform(request).andReturn();
  }

  private long count(String table) {
    return jdbc.sql("SELECT COUNT(*) FROM " + table).query(Long.class).single();
  }

  private String siteName() {
    return jdbc.sql("SELECT name FROM site WHERE id = ?")
        .param(fixture.siteId)
        .query(String.class)
        .single();
  }

  // ------------------------------------------------------------ the six causes

  @Test
  void diversityMethodSavedFromAStaleVersionShowsTheConflictNotAServerError() throws Exception {
    long version =
        jdbc.sql("SELECT version FROM diversity_method WHERE method_key = ?")
            .param(fixture.methodKey)
            .query(Long.class)
            .single();
    MvcResult stale =
        perform(
            post("/methods/{key}", fixture.methodKey)
                .param("version", Long.toString(version + 7))
                .param("name", "Edited meanwhile")
                .with(pageEditor())
                .with(csrf()));
    assertThat(stale.getResponse().getStatus()).isEqualTo(409);
    assertThat(stale.getResponse().getContentAsString())
        .contains("Someone else saved this method after you opened it")
        .contains("Edited meanwhile");
  }

  @Test
  void diversityMethodWithAnUnknownKeyIsNotFoundAndABuiltInOneIsRefused() throws Exception {
    MvcResult unknown =
        perform(
            post("/methods/{key}", "no-such-method")
                .param("version", "0")
                .param("name", "x")
                .with(pageEditor())
                .with(csrf()));
    assertThat(unknown.getResponse().getStatus()).isEqualTo(404);
    MvcResult builtIn =
        perform(
            post("/methods/{key}", "uk-small-shop")
                .param("version", "0")
                .param("name", "x")
                .with(pageEditor())
                .with(csrf()));
    assertThat(builtIn.getResponse().getStatus()).isEqualTo(422);
    assertThat(builtIn.getResponse().getContentAsString()).contains("key");
  }

  @Test
  void mappingStepNamingAnUnknownColumnMeaningIsRefusedNamingTheColumn() throws Exception {
    MvcResult result =
        perform(
            post("/boards/{b}/import/{t}/mapping", fixture.boardId, fixture.uploadToken)
                .param("sheet", "0")
                .param("column0", "way")
                .with(pageEditor())
                .with(csrf()));
    assertThat(result.getResponse().getStatus()).isEqualTo(422);
    assertThat(result.getResponse().getContentAsString())
        .contains("column0")
        .contains("Unknown column meaning");
  }

  @ParameterizedTest
  @ValueSource(strings = {"site", "board", "circuit"})
  void indexedFieldNamesAreRefusedOnTheForms(String form) throws Exception {
    String url =
        switch (form) {
          case "site" -> "/sites/" + fixture.siteId;
          case "board" -> "/boards/" + fixture.boardId;
          default -> "/circuits/" + fixture.circuitId;
        };
    long circuits = count("circuit");
    String before = siteName();
    MvcResult result =
        perform(
            post(url)
                .param("name[0]", "x")
                .param("reference[0]", "x")
                .param("description[0]", "x")
                .with(pageEditor())
                .with(csrf()));
    assertThat(result.getResponse().getStatus()).isEqualTo(400);
    assertThat(result.getResponse().getContentAsString()).contains("brackets");
    assertThat(count("circuit")).isEqualTo(circuits);
    assertThat(siteName()).isEqualTo(before);
  }

  @Test
  void uploadWhoseFileNameHoldsNulIsRefused() throws Exception {
    MvcResult result =
        perform(
            multipart("/boards/{id}/import", fixture.boardId)
                .file(
                    new MockMultipartFile(
                        "file",
                        "sched\u0000ule.csv",
                        "text/csv",
                        "Cct,Description\n1,Lights\n".getBytes(StandardCharsets.UTF_8)))
                .with(pageEditor())
                .with(csrf()));
    assertThat(result.getResponse().getStatus()).isEqualTo(400);
    assertThat(result.getResponse().getContentAsString()).contains("file name").contains("U+0000");
  }

  /** Every page form that stores text, and the change-log reason, with U+0000 in it. */
  @ParameterizedTest
  @ValueSource(
      strings = {
        "site name",
        "site notes",
        "board reference",
        "circuit description",
        "load description",
        "change-log reason"
      })
  void nulInAnyStoredTextOfThePagesIsRefusedAndNothingIsStored(String what) throws Exception {
    long circuits = count("circuit");
    long loads = count("load_item");
    long log = count("change_log");
    MockHttpServletRequestBuilder request =
        switch (what) {
          case "site name" -> siteForm("Hard\u0000ening", "notes");
          case "site notes" -> siteForm("Hardening site", "line one\u0000");
          case "board reference" ->
              form(post("/sites/{id}/boards", fixture.siteId), Fixture.boardJson("NUL\u0000DB", 3));
          case "circuit description" ->
              form(
                  post("/boards/{id}/circuits", fixture.boardId),
                  Fixture.circuitJson(3, "L2", "Sock\u0000ets"));
          case "load description" ->
              form(
                  post("/circuits/{id}/loads", fixture.circuitId),
                  Fixture.loadJson("Toa\u0000ster"));
          default ->
              form(post("/circuits/{id}/loads", fixture.circuitId), Fixture.loadJson("Toaster"))
                  .param("reason", "because\u0000");
        };
    MvcResult result = perform(request.with(pageEditor()).with(csrf()));
    assertThat(result.getResponse().getStatus()).isBetween(400, 499);
    assertThat(result.getResponse().getContentAsString()).contains("control character");
    assertThat(count("circuit")).isEqualTo(circuits);
    assertThat(count("load_item")).isEqualTo(loads);
    assertThat(count("change_log")).isEqualTo(log);
  }

  /** The JSON API: the load endpoint and the others answer 400 naming the field, never 409/500. */
  @ParameterizedTest
  @ValueSource(strings = {"site", "board", "circuit", "load"})
  void nulInAnyStoredTextOfTheApiIsABadRequestNamingTheField(String what) throws Exception {
    long loads = count("load_item");
    long circuits = count("circuit");
    String field;
    MvcResult result;
    switch (what) {
      case "site" -> {
        field = "name";
        result = perform(json(post("/api/sites"), Fixture.siteJson("Api\u0000site")));
      }
      case "board" -> {
        field = "location";
        Map<String, Object> board = Fixture.boardJson("API-B", 3);
        board.put("location", "Yard\u0000");
        result = perform(json(post("/api/sites/" + fixture.siteId + "/boards"), board));
      }
      case "circuit" -> {
        field = "description";
        result =
            perform(
                json(
                    post("/api/boards/" + fixture.boardId + "/circuits"),
                    Fixture.circuitJson(5, "L3", "Hob\u0000")));
      }
      default -> {
        field = "description";
        result =
            perform(
                json(
                    post("/api/circuits/" + fixture.circuitId + "/loads"),
                    Fixture.loadJson("Lamp\u0000")));
      }
    }
    assertThat(result.getResponse().getStatus()).isEqualTo(400);
    assertThat(result.getResponse().getContentAsString())
        .contains("\"field\":\"" + field + "\"")
        .contains("U+0000");
    assertThat(count("load_item")).isEqualTo(loads);
    assertThat(count("circuit")).isEqualTo(circuits);
  }

  // ------------------------------------------------------------ the text rules

  @Test
  void namesOfOnlyInvisibleCharactersAreRefusedBesideTheField() throws Exception {
    MvcResult result =
        perform(siteForm("\u200B \u00A0\u2060", "notes").with(pageEditor()).with(csrf()));
    assertThat(result.getResponse().getStatus()).isEqualTo(422);
    assertThat(result.getResponse().getContentAsString())
        .contains("Needs at least one visible letter");
  }

  @Test
  void textDirectionOverridesAreRefusedOnPagesAndApi() throws Exception {
    MvcResult page =
        perform(siteForm("Works\u202Egnp.exe", "notes").with(pageEditor()).with(csrf()));
    assertThat(page.getResponse().getStatus()).isEqualTo(422);
    assertThat(page.getResponse().getContentAsString()).contains("text-direction control");
    MvcResult viaApi =
        perform(
            json(
                post("/api/boards/" + fixture.boardId + "/circuits"),
                Fixture.circuitJson(6, "L1", "Fan\u2066")));
    assertThat(viaApi.getResponse().getStatus()).isEqualTo(400);
    assertThat(viaApi.getResponse().getContentAsString()).contains("U+2066");
    assertThat(siteName()).doesNotContain("\u202E");
  }

  @Test
  void lineBreaksAreKeptInNotesButRefusedInAReference() throws Exception {
    MvcResult notes =
        perform(
            siteForm("Hardening kept " + fixture.siteId, "first line\r\nsecond\tline")
                .with(pageEditor())
                .with(csrf()));
    assertThat(notes.getResponse().getStatus()).isEqualTo(302);
    assertThat(
            jdbc.sql("SELECT notes FROM site WHERE id = ?")
                .param(fixture.siteId)
                .query(String.class)
                .single())
        .as("CR LF normalised to LF, tab kept in a multi-line field")
        .isEqualTo("first line\nsecond\tline");
    MvcResult reference =
        perform(
            form(post("/sites/{id}/boards", fixture.siteId), Fixture.boardJson("DB\n2", 3))
                .with(pageEditor())
                .with(csrf()));
    assertThat(reference.getResponse().getStatus()).isEqualTo(422);
    assertThat(reference.getResponse().getContentAsString()).contains("Contains a line break");
  }

  @Test
  void textIsStoredInNormalFormC() throws Exception {
    // "e" followed by U+0301 COMBINING ACUTE ACCENT is stored as the single U+00E9.
    perform(
        siteForm("Cafe\u0301 works " + fixture.siteId, "notes").with(pageEditor()).with(csrf()));
    assertThat(siteName()).isEqualTo("Caf\u00E9 works " + fixture.siteId);
  }

  @Test
  void importedRowWithAControlCharacterIsARowProblemNotAStoredCircuit() throws Exception {
    String csv = "Cct,Phase,Description,Protection,Load kW\n2,L2,Ligh\u0007ts,B6,0.5\n";
    String location =
        mvc.perform(
                multipart("/boards/{id}/import", fixture.boardId)
                    .file(
                        new MockMultipartFile(
                            "file", "bell.csv", "text/csv", csv.getBytes(StandardCharsets.UTF_8)))
                    .with(pageEditor())
                    .with(csrf()))
            .andReturn()
            .getResponse()
            .getRedirectedUrl();
    assertThat(location).endsWith("/mapping");
    String token = location.split("/")[4];
    perform(
        post(location)
            .param("sheet", "0")
            .param("column0", "WAY")
            .param("column1", "LINE")
            .param("column2", "CIRCUIT")
            .param("column3", "DEVICE_SUMMARY")
            .param("column4", "LOAD_KILOWATTS")
            .with(pageEditor())
            .with(csrf()));
    MvcResult preview =
        perform(get("/boards/{b}/import/{t}/preview", fixture.boardId, token).with(pageEditor()));
    assertThat(preview.getResponse().getContentAsString()).contains("control character");
    long circuits = count("circuit");
    MvcResult store =
        perform(
            post("/boards/{b}/import/{t}", fixture.boardId, token)
                .param("mode", "all")
                .with(pageEditor())
                .with(csrf()));
    assertThat(store.getResponse().getStatus()).isEqualTo(422);
    assertThat(count("circuit")).isEqualTo(circuits);
  }

  @Test
  void jsonEnumsGivenAsNumbersAreRefused() throws Exception {
    Map<String, Object> circuit = Fixture.circuitJson(7, "L1", "Numbered");
    circuit.put("deviceKind", 0);
    MvcResult result = perform(json(post("/api/boards/" + fixture.boardId + "/circuits"), circuit));
    assertThat(result.getResponse().getStatus()).isEqualTo(400);
    assertThat(result.getResponse().getContentAsString()).contains("deviceKind");
  }

  // ------------------------------------------------------------ exports

  @Test
  void csvCellsHoldingTheSeparatorOrAFormulaAreQuotedOrNeutralised() throws Exception {
    perform(
        json(
            post("/api/boards/" + fixture.boardId + "/circuits"),
            Fixture.circuitJson(8, "L3", "safe;=1+1")));
    perform(
        json(
            post("/api/boards/" + fixture.boardId + "/circuits"),
            Fixture.circuitJson(9, "L1", "=HYPERLINK(\"x\")")));
    String csv =
        perform(get("/boards/{id}/export.csv", fixture.boardId).with(pageEditor()))
            .getResponse()
            .getContentAsString(StandardCharsets.UTF_8);
    // OWASP CSV injection advice (owasp.org, "CSV Injection"): quote every cell, and prefix a
    // cell starting with = + - @ with a single quote.
    assertThat(csv).contains("\"safe;=1+1\"").doesNotContain(",safe;=1+1,");
    assertThat(csv).contains("\"'=HYPERLINK(\"\"x\"\")\"");
  }

  @Test
  void workbookOfABoardWhoseStoredReferenceHoldsAControlCharacterIsWellFormedXml()
      throws Exception {
    // Data stored before the text rules existed: written straight into the table.
    jdbc.sql("UPDATE board SET reference = ? WHERE id = ?")
        .params("K\u0001B\u202E1", fixture.boardId)
        .update();
    byte[] xlsx =
        perform(get("/boards/{id}/export.xlsx", fixture.boardId).with(pageEditor()))
            .getResponse()
            .getContentAsByteArray();
    int parsed = 0;
    java.nio.file.Path file = java.nio.file.Files.createTempFile("hardening", ".xlsx");
    java.nio.file.Files.write(file, xlsx);
    try (java.util.zip.ZipFile zip = new java.util.zip.ZipFile(file.toFile())) {
      for (ZipEntry entry : java.util.Collections.list(zip.entries())) {
        if (entry.getName().endsWith(".xml")) {
          DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
          factory.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
          factory.newDocumentBuilder().parse(zip.getInputStream(entry));
          parsed++;
        }
      }
    } finally {
      java.nio.file.Files.delete(file);
    }
    assertThat(parsed).as("workbook.xml and every sheet parsed").isGreaterThan(3);
  }

  // ------------------------------------------------------------ helpers

  private MockHttpServletRequestBuilder siteForm(String name, String notes) {
    Map<String, Object> site = Fixture.siteJson(name);
    site.put("notes", notes);
    site.put(
        "version",
        jdbc.sql("SELECT version FROM site WHERE id = ?")
            .param(fixture.siteId)
            .query(Long.class)
            .single());
    return form(post("/sites/{id}", fixture.siteId), site);
  }

  private static MockHttpServletRequestBuilder form(
      MockHttpServletRequestBuilder request, Map<String, Object> fields) {
    fields.forEach((name, value) -> request.param(name, String.valueOf(value)));
    return request;
  }

  private static MockHttpServletRequestBuilder json(
      MockHttpServletRequestBuilder request, Object body) {
    return request
        .contentType(MediaType.APPLICATION_JSON)
        .content(Fixture.JSON.writeValueAsString(body))
        .with(api());
  }
}
