package com.wayledger.board;

import static com.wayledger.support.Roles.admin;
import static com.wayledger.support.Roles.editor;
import static com.wayledger.support.Roles.viewer;
import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.flash;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.context.MessageSource;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.annotation.DirtiesContext;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;

/** The wording slips a new user met on the demo site, each named by the test that shows it gone. */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles({"test", "demo"})
@DirtiesContext
class WordingSlipsIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired JdbcClient jdbc;
  @Autowired MessageSource messages;
  @Autowired ScheduleService schedule;

  private String msg(String key, Object... args) {
    return messages.getMessage(key, args, Locale.UK);
  }

  @Test
  void oneCircuitMovedAndOneMoveAreSingular() {
    // slips: "1 circuits moved", "(1 moves)"
    assertThat(msg("balance.applied", 1)).startsWith("1 circuit moved.");
    assertThat(msg("balance.applied", 12)).startsWith("12 circuits moved.");
    assertThat(msg("balance.after.moves", 1)).isEqualTo("With 1 move");
    assertThat(msg("balance.after.moves", 3)).isEqualTo("With 3 moves");
    assertThat(msg("balance.after.optimalMoves", 1)).isEqualTo("With the best plan (1 move)");
    assertThat(msg("findings.group.ways", 1, "3")).isEqualTo("way 3");
    assertThat(msg("findings.group.ways", 3, "3, 5, 9")).isEqualTo("3 ways: 3, 5, 9");
  }

  @Test
  void balancingPageSpeaksNoAlgorithmJargon() throws Exception {
    // slip: "Searched 215 arrangements"
    String page = page(get("/boards/{id}/balance", board("KB1")).with(viewer()));
    assertThat(page).doesNotContain("arrangements compared").doesNotContain("Searched");
    assertThat(page).as("no plural after one").doesNotContainPattern("\\b1 moves");
    assertThat(page.split("<title", -1))
        .as("one title: the chart's label is not pulled into the page head")
        .hasSize(2);
  }

  @Test
  void afterUndoTheBannerSaysUndoneNotMoved() throws Exception {
    // slip: the balancing banner still said "12 circuits moved" after Undo
    long kb1 = board("KB1");
    String page = page(get("/boards/{id}/balance", kb1).with(editor()));
    MvcResult applied =
        mvc.perform(
                post("/boards/{id}/balance/apply", kb1)
                    .param("placements", hidden(page, "placements"))
                    .param("undo", hidden(page, "undo"))
                    .param("version", hidden(page, "version"))
                    .with(editor())
                    .with(csrf()))
            .andExpect(flash().attributeExists("applied"))
            .andReturn();
    String undoTokens = (String) applied.getFlashMap().get("undoTokens");
    String afterApply = page(get("/boards/{id}/balance", kb1).with(editor()));
    mvc.perform(
            post("/boards/{id}/balance/apply", kb1)
                .param("placements", undoTokens)
                .param("version", hidden(afterApply, "version"))
                .param("undoing", "true")
                .with(editor())
                .with(csrf()))
        .andExpect(status().is3xxRedirection())
        .andExpect(flash().attributeExists("undone"))
        .andExpect(flash().attributeCount(1));
  }

  @Test
  void theSiteFormOffersNoDiversityOnce() throws Exception {
    // slip: both "none (connected load = demand)" and "No diversity" offered
    String page = page(get("/sites/{id}/edit", site()).with(admin()));
    assertThat(page.split("No diversity", -1)).as("choices named No diversity").hasSize(2);
    assertThat(page).doesNotContain("none (connected load = demand)");
  }

  @Test
  void theHeadroomAddressOpenedDirectlyIsAWholeStyledPage() throws Exception {
    // slip: /sites/{id}/headroom opened directly showed an unstyled fragment
    String whole = page(get("/sites/{id}/headroom", site()).with(viewer()));
    assertThat(whole).contains("<html").contains("stylesheet").contains("class=\"caution\"");
    String part =
        page(get("/sites/{id}/headroom", site()).header("HX-Request", "true").with(viewer()));
    assertThat(part).doesNotContain("<html").contains("id=\"headroom-table\"");
  }

  @Test
  void oneHeadroomStateHasOneNameAndOneTriangle() throws Exception {
    // slips: three names for one headroom state, a doubled "▲ ▲"
    String table =
        page(get("/sites/{id}/headroom", site()).header("HX-Request", "true").with(viewer()));
    assertThat(table).doesNotContain("above threshold").doesNotContain("little headroom");
    assertThat(table)
        .as("the state cell carries its own symbol, so no CSS triangle is added before it")
        .doesNotContainPattern("class=\"over\"[^>]*>\\s*[▲◆]");
    String sitePage = page(get("/sites/{id}", site()).with(viewer()));
    assertThat(sitePage).doesNotContain("little headroom");
    assertThat(msg("tree.headroom.low")).isEqualTo("◆ near its limit");
  }

  @Test
  void aSubBoardNamesTheBoardAndWayThatFeedItNeverAnId() throws Exception {
    // slips: "fed from board #1", a board form asking for "Circuit id on the parent board"
    var sub =
        jdbc.sql(
                "SELECT b.id, p.reference, c.way_number FROM board b JOIN board p ON p.id ="
                    + " b.parent_board_id JOIN circuit c ON c.id = b.fed_from_circuit_id ORDER BY b.id")
            .query((rs, n) -> new Object[] {rs.getLong(1), rs.getString(2), rs.getInt(3)})
            .list()
            .get(0);
    String page = page(get("/boards/{id}", sub[0]).with(viewer()));
    assertThat(page).contains(sub[1] + ", way " + sub[2]).doesNotContain("board #");
    String form = page(get("/boards/{id}/edit", sub[0]).with(editor()));
    assertThat(form).doesNotContain("Circuit id");
    assertThat(form)
        .as("the feeding way is picked by its board and way")
        .containsPattern("<option[^>]*selected[^>]*>" + sub[1] + " way " + sub[2] + " ");
  }

  @Test
  void aLogLineSaysWhatChanged() throws Exception {
    // slip: log lines reading "circuit changed …: changed" with no detail
    long circuitId =
        jdbc.sql(
                "SELECT c.id FROM circuit c JOIN board b ON b.id = c.board_id"
                    + " WHERE b.reference = 'KB1' AND c.device_rating_amps IS NOT NULL"
                    + " ORDER BY c.way_number")
            .query(Long.class)
            .list()
            .get(0);
    Circuit circuit = schedule.circuit(circuitId);
    CircuitForm form = CircuitForm.of(circuit);
    double rating = form.deviceRatingAmps();
    CircuitForm changed = with(form, "deviceRatingAmps", rating + 4);
    schedule.updateCircuit(circuitId, changed, "WO-88");
    String summary =
        jdbc.sql("SELECT summary FROM change_log WHERE circuit_id = ? ORDER BY id DESC")
            .param(circuitId)
            .query(String.class)
            .list()
            .get(0);
    assertThat(summary)
        .endsWith(
            "changed "
                + msg("circuit.deviceRatingAmps")
                + " "
                + plain(rating)
                + " → "
                + plain(rating + 4));
  }

  /** A copy of the form with one field changed, whatever fields the form has. */
  private static CircuitForm with(CircuitForm form, String field, Object value) throws Exception {
    var components = CircuitForm.class.getRecordComponents();
    Object[] args = new Object[components.length];
    Class<?>[] types = new Class<?>[components.length];
    for (int i = 0; i < components.length; i++) {
      types[i] = components[i].getType();
      args[i] =
          components[i].getName().equals(field) ? value : components[i].getAccessor().invoke(form);
    }
    return CircuitForm.class.getDeclaredConstructor(types).newInstance(args);
  }

  private static String plain(double value) {
    return java.math.BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
  }

  private String page(org.springframework.test.web.servlet.RequestBuilder request)
      throws Exception {
    return mvc.perform(request)
        .andExpect(status().isOk())
        .andReturn()
        .getResponse()
        .getContentAsString();
  }

  private long site() {
    return jdbc.sql("SELECT id FROM site ORDER BY id").query(Long.class).list().get(0);
  }

  private long board(String reference) {
    return jdbc.sql("SELECT id FROM board WHERE reference = ?")
        .param(reference)
        .query(Long.class)
        .single();
  }

  private static String hidden(String page, String name) {
    Matcher m = Pattern.compile("name=\"" + name + "\" value=\"([^\"]*)\"").matcher(page);
    assertThat(m.find()).as("hidden field %s on the page", name).isTrue();
    return m.group(1);
  }
}
