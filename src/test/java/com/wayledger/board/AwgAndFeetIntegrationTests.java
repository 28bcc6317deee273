package com.wayledger.board;

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

import com.jayway.jsonpath.JsonPath;
import java.nio.charset.StandardCharsets;
import java.util.UUID;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
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
 * units (AWG/feet): on a site under the NEC rule set, sizes are typed and read as AWG/kcmil and
 * lengths as feet on the pages, in the API and in the spreadsheets, and stored as mm² and metres;
 * an IEC site keeps mm² and metres. Sites, boards and circuits are invented.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class AwgAndFeetIntegrationTests {

  private static final RequestPostProcessor EDITOR = user("ed").roles("EDITOR");

  // 12 AWG = 3.31 mm² and 2/0 AWG = 67.4 mm² (ASTM B258, from memory); 1 ft = 0.3048 m exactly
  private static final double TWELVE_AWG_MM2 = 3.31;
  private static final double TWO_OUGHT_AWG_MM2 = 67.4;

  @Autowired MockMvc mvc;
  @Autowired JdbcClient jdbc;

  private long site(String ruleSet, String system) throws Exception {
    String name = "Invented units site " + UUID.randomUUID();
    mvc.perform(
            post("/api/sites")
                .with(EDITOR)
                .with(csrf())
                .contentType(MediaType.APPLICATION_JSON)
                .content(
                    """
                    {"name": "%s", "earthingSystem": "TN_C_S", "nominalVoltageVolts": 230,
                     "phases": 1, "frequencyHertz": 60, "prospectiveFaultCurrentKiloAmps": 10,
                     "ruleSet": "%s", "supplySystem": "%s"}
                    """
                        .formatted(name, ruleSet, system)))
        .andExpect(status().isCreated());
    return jdbc.sql("SELECT id FROM site WHERE name = ?").param(name).query(Long.class).single();
  }

  private long necSite() throws Exception {
    return site("NEC", "SPLIT_PHASE_120_240");
  }

  private long boardThroughThePage(long siteId, String reference) throws Exception {
    mvc.perform(
            post("/sites/{id}/boards", siteId)
                .with(EDITOR)
                .with(csrf())
                .param("reference", reference)
                .param("phases", "1")
                .param("wayCount", "42")
                .param("unbalanceLimitPercent", "10")
                .param("coincidenceFactor", "1")
                .param("submainLineSize", "2/0 AWG")
                .param("submainMaterial", "COPPER")
                .param("submainLengthFeet", "75"))
        .andExpect(status().is3xxRedirection());
    return jdbc.sql("SELECT id FROM board WHERE site_id = ? AND reference = ?")
        .params(siteId, reference)
        .query(Long.class)
        .single();
  }

  private org.springframework.test.web.servlet.ResultActions circuitThroughThePage(
      long boardId, int way, String size, String feet) throws Exception {
    return mvc.perform(
        post("/boards/{id}/circuits", boardId)
            .with(EDITOR)
            .with(csrf())
            .param("wayNumber", String.valueOf(way))
            .param("position", "L1")
            .param("description", "Kitchen counter " + way)
            .param("status", "IN_USE")
            .param("deviceKind", "MCB")
            .param("deviceRatingAmps", "20")
            .param("cableLineSize", size)
            .param("cableCpcSize", size)
            .param("cableMaterial", "COPPER")
            .param("cableLengthFeet", feet));
  }

  private long circuitId(long boardId, int way) {
    return jdbc.sql("SELECT id FROM circuit WHERE board_id = ? AND way_number = ?")
        .params(boardId, way)
        .query(Long.class)
        .single();
  }

  @Test
  void aCircuitTypedInAwgAndFeetIsStoredMetricAndComesBackAsTyped() throws Exception {
    long boardId = boardThroughThePage(necSite(), "P-1");
    circuitThroughThePage(boardId, 1, "12 AWG", "50").andExpect(status().is3xxRedirection());
    long id = circuitId(boardId, 1);

    var stored =
        jdbc.sql("SELECT cable_line_csa_mm2, cable_length_metres FROM circuit WHERE id = ?")
            .param(id)
            .query((rs, n) -> new double[] {rs.getDouble(1), rs.getDouble(2)})
            .single();
    assertThat(stored[0]).as("12 AWG stored as mm²").isCloseTo(TWELVE_AWG_MM2, within(0.01));
    assertThat(stored[1]).as("50 ft stored as m (50 × 0.3048)").isCloseTo(15.24, within(1e-9));

    Document editor =
        Jsoup.parse(
            mvc.perform(get("/circuits/{id}/edit", id).with(EDITOR))
                .andExpect(status().isOk())
                .andReturn()
                .getResponse()
                .getContentAsString(StandardCharsets.UTF_8));
    assertThat(editor.select("select[name=cableLineSize] option[selected]").text())
        .as("the size select shows the size typed")
        .isEqualTo("12 AWG");
    assertThat(editor.select("select[name=cableLineSize] option").size())
        .as("blank + the 21 NEC sizes, 14 AWG … 1000 kcmil")
        .isEqualTo(22);
    assertThat(Double.parseDouble(editor.select("input[name=cableLengthFeet]").val()))
        .as("the length shows the feet typed")
        .isEqualTo(50.0);
    assertThat(editor.select("input[name=cableLengthMetres], input[name=cableLineCsa]"))
        .as("no metric inputs on an NEC site")
        .isEmpty();

    // the schedule of an NEC panelboard is the space layout, which has no cable column; the cable
    // is read on the circuit's checks page, the inspection grid and through the API below
    String board =
        mvc.perform(get("/boards/{id}", boardId).with(EDITOR))
            .andReturn()
            .getResponse()
            .getContentAsString(StandardCharsets.UTF_8);
    assertThat(board).as("the submain on the board page").contains("2/0 AWG 75 ft");
    String checks =
        mvc.perform(get("/circuits/{id}", id).with(EDITOR))
            .andReturn()
            .getResponse()
            .getContentAsString(StandardCharsets.UTF_8);
    assertThat(checks).as("the circuit's checks page").contains("12 AWG / 12 AWG 50 ft");
    String inspection =
        mvc.perform(get("/boards/{id}/inspections/new", boardId).with(EDITOR))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString(StandardCharsets.UTF_8);
    assertThat(inspection)
        .as("the inspection grid's recorded cable")
        .contains("12 AWG / 12 AWG 50 ft");
  }

  @Test
  void savingTheEditorUnchangedKeepsTheSizeAndLengthExactly() throws Exception {
    long boardId = boardThroughThePage(necSite(), "P-2");
    circuitThroughThePage(boardId, 1, "10 AWG", "33.3").andExpect(status().is3xxRedirection());
    long id = circuitId(boardId, 1);
    double before =
        jdbc.sql("SELECT cable_length_metres FROM circuit WHERE id = ?")
            .param(id)
            .query(Double.class)
            .single();
    long version =
        jdbc.sql("SELECT version FROM circuit WHERE id = ?").param(id).query(Long.class).single();
    mvc.perform(
            post("/circuits/{id}", id)
                .with(EDITOR)
                .with(csrf())
                .param("version", String.valueOf(version))
                .param("wayNumber", "1")
                .param("position", "L1")
                .param("description", "Kitchen counter 1")
                .param("status", "IN_USE")
                .param("deviceKind", "MCB")
                .param("deviceRatingAmps", "20")
                .param("cableLineSize", "10 AWG")
                .param("cableCpcSize", "10 AWG")
                .param("cableMaterial", "COPPER")
                .param("cableLengthFeet", "33.3"))
        .andExpect(status().is3xxRedirection());
    assertThat(
            jdbc.sql("SELECT version FROM circuit WHERE id = ?")
                .param(id)
                .query(Long.class)
                .single())
        .as("nothing changed, nothing stored")
        .isEqualTo(version);
    assertThat(
            jdbc.sql("SELECT cable_length_metres FROM circuit WHERE id = ?")
                .param(id)
                .query(Double.class)
                .single())
        .isEqualTo(before);
  }

  @Test
  void aSizeThatIsNoNecSizeIsRefusedBesideItsFieldAndNothingIsStored() throws Exception {
    long boardId = boardThroughThePage(necSite(), "P-3");
    String page =
        circuitThroughThePage(boardId, 1, "13 AWG", "50")
            .andExpect(status().isUnprocessableContent())
            .andReturn()
            .getResponse()
            .getContentAsString(StandardCharsets.UTF_8);
    Document doc = Jsoup.parse(page);
    assertThat(doc.select(".field.has-error select[name=cableLineSize]"))
        .as("the size field is marked")
        .hasSize(1);
    assertThat(doc.select("#cableLineSize-error").text())
        .as("the message beside the size field")
        .contains("13 AWG is not an NEC conductor size");
    assertThat(
            jdbc.sql("SELECT COUNT(*) FROM circuit WHERE board_id = ?")
                .param(boardId)
                .query(Long.class)
                .single())
        .as("nothing stored")
        .isZero();
  }

  @Test
  void theApiReadsAndTakesSizesAndLengthsInTheSitesUnitsAndRefusesTheOthers() throws Exception {
    long boardId = boardThroughThePage(necSite(), "P-4");
    String created =
        mvc.perform(
                post("/api/boards/{id}/circuits", boardId)
                    .with(EDITOR)
                    .with(csrf())
                    .contentType(MediaType.APPLICATION_JSON)
                    .content(
                        """
                        {"wayNumber": 3, "position": "L1", "description": "Dryer", "status": "IN_USE",
                         "deviceKind": "MCB", "deviceRatingAmps": 30, "cableLineSize": "10 AWG",
                         "cableMaterial": "COPPER", "cableLengthFeet": 40}
                        """))
            .andExpect(status().isCreated())
            .andReturn()
            .getResponse()
            .getContentAsString();
    long id = Long.parseLong(created.strip());

    String read =
        mvc.perform(get("/api/circuits/{id}", id).with(EDITOR))
            .andExpect(status().isOk())
            .andExpect(jsonPath("$.fields.cableLineSize").value("10 AWG"))
            .andExpect(jsonPath("$.fields.cableLengthFeet").value(40.0))
            .andExpect(jsonPath("$.fields.cableLineCsa").doesNotExist())
            .andExpect(jsonPath("$.fields.cableLengthMetres").doesNotExist())
            .andExpect(jsonPath("$.cable").value("10 AWG 40 ft"))
            .andReturn()
            .getResponse()
            .getContentAsString();
    Number version = JsonPath.read(read, "$.fields.version");

    mvc.perform(
            put("/api/circuits/{id}", id)
                .with(EDITOR)
                .with(csrf())
                .contentType(MediaType.APPLICATION_JSON)
                .content(
                    """
                    {"version": %d, "wayNumber": 3, "position": "L1", "description": "Dryer",
                     "status": "IN_USE", "deviceKind": "MCB", "deviceRatingAmps": 30,
                     "cableLineCsa": 5.26, "cableLengthFeet": 40}
                    """
                        .formatted(version.longValue())))
        .andExpect(status().is4xxClientError())
        .andExpect(jsonPath("$.fields[0].field").value("cableLineCsa"))
        .andExpect(
            jsonPath("$.fields[0].message")
                .value(org.hamcrest.Matchers.containsString("give cableLineSize instead")));

    mvc.perform(get("/api/boards/{id}", boardId).with(EDITOR))
        .andExpect(status().isOk())
        .andExpect(jsonPath("$.fields.submainLineSize").value("2/0 AWG"))
        .andExpect(jsonPath("$.fields.submainLengthFeet").value(75.0));
    assertThat(
            jdbc.sql("SELECT submain_line_csa_mm2 FROM board WHERE id = ?")
                .param(boardId)
                .query(Double.class)
                .single())
        .as("2/0 AWG stored as mm²")
        .isCloseTo(TWO_OUGHT_AWG_MM2, within(0.1));
  }

  @Test
  void anIecSiteKeepsSquareMillimetresAndMetresAndRefusesFeet() throws Exception {
    long siteId = site("IEC", "IEC_WYE");
    mvc.perform(
            post("/sites/{id}/boards", siteId)
                .with(EDITOR)
                .with(csrf())
                .param("reference", "DB-1")
                .param("phases", "1")
                .param("wayCount", "12")
                .param("unbalanceLimitPercent", "10")
                .param("coincidenceFactor", "1"))
        .andExpect(status().is3xxRedirection());
    long boardId =
        jdbc.sql("SELECT id FROM board WHERE site_id = ?").param(siteId).query(Long.class).single();
    mvc.perform(
            post("/api/boards/{id}/circuits", boardId)
                .with(EDITOR)
                .with(csrf())
                .contentType(MediaType.APPLICATION_JSON)
                .content(
                    """
                    {"wayNumber": 1, "position": "L1", "description": "Sockets", "status": "IN_USE",
                     "deviceKind": "MCB", "deviceRatingAmps": 32, "cableLineCsa": 2.5,
                     "cableLengthFeet": 60}
                    """))
        .andExpect(status().is4xxClientError())
        .andExpect(jsonPath("$.fields[0].field").value("cableLengthFeet"));
    String editor =
        mvc.perform(
                get("/boards/{id}/circuits/new", boardId)
                    .param("way", "1")
                    .param("position", "L1")
                    .with(EDITOR))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString(StandardCharsets.UTF_8);
    Document doc = Jsoup.parse(editor);
    assertThat(doc.select("input[name=cableLineCsa]")).as("mm² input").hasSize(1);
    assertThat(doc.select("input[name=cableLengthMetres]")).as("metres input").hasSize(1);
    assertThat(doc.select("[name=cableLineSize], [name=cableLengthFeet]")).isEmpty();
  }

  @Test
  void anNecBoardsWorkbookAndCsvSayAwgAndFeetAndTheCsvImportsBackTheSame() throws Exception {
    long siteId = necSite();
    long source = boardThroughThePage(siteId, "P-5");
    circuitThroughThePage(source, 1, "12 AWG", "50").andExpect(status().is3xxRedirection());
    circuitThroughThePage(source, 3, "250 kcmil", "120.5").andExpect(status().is3xxRedirection());

    byte[] xlsx =
        mvc.perform(get("/boards/{id}/export.xlsx", source).with(EDITOR))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsByteArray();
    var table = com.wayledger.exchange.SpreadsheetReader.read(xlsx, "p5.xlsx", -1);
    assertThat(table.headers()).contains("Line AWG/kcmil", "CPC AWG/kcmil", "Length ft");

    byte[] csv =
        mvc.perform(get("/boards/{id}/export.csv", source).with(EDITOR))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsByteArray();
    String text = new String(csv, StandardCharsets.UTF_8);
    assertThat(text).contains("\"12 AWG\"", "\"250 kcmil\"", "\"120.5\"", "\"50\"");

    long target = boardThroughThePage(siteId, "P-6");
    String preview =
        mvc.perform(
                multipart("/boards/{id}/import", target)
                    .file(new MockMultipartFile("file", "p5.csv", "text/csv", csv))
                    .with(EDITOR)
                    .with(csrf()))
            .andExpect(status().is3xxRedirection())
            .andReturn()
            .getResponse()
            .getRedirectedUrl();
    String previewPage =
        mvc.perform(get(preview).with(EDITOR))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString(StandardCharsets.UTF_8);
    assertThat(previewPage)
        .as("the preview says how each column is read and shows the site's units")
        .contains("Column “Line AWG/kcmil”: line conductor in AWG/kcmil")
        .contains("Column “Length ft”: cable length in feet")
        .contains("12 AWG 50 ft");
    String token = preview.split("/")[4];
    mvc.perform(
            post("/boards/{id}/import/{t}", target, token)
                .param("mode", "all")
                .with(EDITOR)
                .with(csrf()))
        .andExpect(status().is3xxRedirection());

    String cables =
        "SELECT way_number, cable_line_csa_mm2, cable_cpc_csa_mm2, cable_length_metres"
            + " FROM circuit WHERE board_id = ? ORDER BY way_number";
    var before = jdbc.sql(cables).param(source).query().listOfRows();
    var after = jdbc.sql(cables).param(target).query().listOfRows();
    assertThat(after).as("same sizes and lengths after the round trip").hasSize(2);
    for (int i = 0; i < 2; i++) {
      for (String column :
          new String[] {"cable_line_csa_mm2", "cable_cpc_csa_mm2", "cable_length_metres"}) {
        assertThat(((Number) after.get(i).get(column)).doubleValue())
            .as("row %d %s", i, column)
            .isCloseTo(((Number) before.get(i).get(column)).doubleValue(), within(1e-9));
      }
    }
  }
}
