package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.PhasePosition;
import com.wayledger.loadlog.LogFixtures;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;

/**
 * The schedule table prints its rows without the template's own blank lines and indentation, and
 * says once on the table what every row would otherwise repeat, while each row keeps its text,
 * links, ids and buttons.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class ScheduleMarkupIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired ScheduleService schedule;

  Board board;
  Circuit lights;
  Circuit oven;

  @BeforeEach
  void threePhaseBoardWithASingleAndAThreePoleCircuit() {
    Site site = sites.create(LogFixtures.site());
    board = boards.create(site.getId(), LogFixtures.board("DB-M1", 63.0));
    lights =
        schedule.addCircuit(board.getId(), LogFixtures.circuit(1, PhasePosition.L1, "Lights", 500));
    oven =
        schedule.addCircuit(
            board.getId(), LogFixtures.circuit(2, PhasePosition.THREE_POLE, "Oven", 9000));
  }

  @Test
  void rowsCarryNoTemplateWhitespaceAndOneLineEach() throws Exception {
    String page = page("editor", "EDITOR");
    int table = page.indexOf("id=\"schedule\"");
    String body =
        page.substring(page.indexOf("<tbody", table), page.indexOf("</tbody>", table))
            .stripTrailing();

    assertThat(body).as("no indentation, no blank line").doesNotContain("\n ", "\n\n", "\t");
    Element tbody = Jsoup.parse(page).getElementById("schedule").selectFirst("tbody");
    assertThat(body.lines().count())
        .as("the tbody's opening tag, then one printed line per row")
        .isEqualTo(1 + tbody.select("> tr").size());
    // 6 ways of 3 lines: every position has a row
    assertThat(tbody.select("> tr")).hasSize(18);
  }

  @Test
  void eachRowKeepsItsTextLinksAndButtons() throws Exception {
    Document page = Jsoup.parse(page("editor", "EDITOR"));
    Element tbody = page.getElementById("schedule").selectFirst("tbody");

    Element single = page.getElementById("pos-1-L1");
    assertThat(single.selectFirst("th[scope=row]").text()).isEqualTo("1 L1");
    assertThat(single.selectFirst("a[href=/circuits/" + lights.getId() + "]").text())
        .isEqualTo("Lights");
    // 500 W at unity power factor: 0.50 kW connected (hand calculation)
    assertThat(single.select("td.num").eachText()).first().isEqualTo("0.50");
    assertThat(single.select("td[rowspan]")).as("a circuit on one row prints no rowspan").isEmpty();

    Element threePole = page.getElementById("pos-2-L1");
    assertThat(threePole.select("td").eachAttr("rowspan"))
        .as("a three-pole circuit's cells span its three rows")
        .isNotEmpty()
        .containsOnly("3");
    assertThat(page.getElementById("pos-2-L2").hasClass("continuation")).isTrue();
    assertThat(page.getElementById("pos-2-L3").text()).isEqualTo("2 L3");

    // the buttons take hx-target and hx-swap from the tbody; the delete names its own target
    assertThat(tbody.attr("hx-target")).isEqualTo("closest tr");
    assertThat(tbody.attr("hx-swap")).isEqualTo("outerHTML");
    Element edit = single.selectFirst("button[hx-get=/circuits/" + lights.getId() + "/edit]");
    assertThat(edit.attr("aria-label")).isEqualTo("Edit Lights");
    assertThat(edit.hasAttr("hx-target")).isFalse();
    Element delete = single.selectFirst("button[hx-post=/circuits/" + lights.getId() + "/delete]");
    assertThat(delete.attr("hx-target")).isEqualTo("#schedule");
    assertThat(delete.attr("aria-label")).isEqualTo("Delete Lights");
    assertThat(single.selectFirst("td.row-actions").text()).isEqualTo("Edit Delete");
    Element add = page.getElementById("pos-1-L2").selectFirst("button.add");
    assertThat(add.attr("hx-get")).contains("way=1").contains("position=L2");

    // the circuit link's hint is said once, on the column heading
    assertThat(single.selectFirst("a[href=/circuits/" + lights.getId() + "]").hasAttr("title"))
        .isFalse();
    assertThat(page.select("#schedule thead abbr").eachAttr("title"))
        .contains("A circuit's name opens its checks, proposal and time–current chart");
    assertThat(page.select("footer.caution")).as("the short caution stays").hasSize(1);
  }

  private String page(String name, String role) throws Exception {
    return PageFixtures.boardPage(mvc, board.getId(), name, role);
  }
}
