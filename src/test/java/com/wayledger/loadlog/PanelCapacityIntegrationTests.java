package com.wayledger.loadlog;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.board.BoardService;
import com.wayledger.board.ScheduleService;
import com.wayledger.site.SiteService;
import com.wayledger.support.NecPanels;
import java.util.List;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.RequestPostProcessor;

/**
 * "Can it take it?" on a 120/240 V panelboard: the free spaces offered are where the panel has
 * them, each on the leg its row gives (space 1 A, space 3 B, … — common practice), both legs
 * offered, and the line columns and the load history name the legs A and B. The panel and its loads
 * are invented.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class PanelCapacityIntegrationTests {

  private static final RequestPostProcessor VIEWER = user("viewer").roles("VIEWER");

  @Autowired MockMvc mvc;
  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired ScheduleService schedule;

  private Document page(String path, Object... vars) throws Exception {
    return Jsoup.parse(
        mvc.perform(get(path, vars).with(VIEWER))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString());
  }

  @Test
  void aSplitPhasePanelOffersItsFreeSpacesOnBothLegsEachOnItsRowsLeg() throws Exception {
    long panel = NecPanels.splitPhasePanel(sites, boards, schedule).getId();
    // taken: spaces 1 and 2 (row 1, leg A), 3 and 5 (the two-pole water heater: rows 2 and 3),
    // 8 (row 4, leg B). Free: 4 (row 2, B), 6 (row 3, A), 7 (row 4, B), 9 (row 5, A), …
    Document answer =
        page(
            "/boards/{id}/can-it-take-it?ask=1&description=Freezer&category=FIXED_APPLIANCE"
                + "&ratingValue=600&ratingUnit=W&powerFactor=1",
            panel);
    List<String> places =
        answer.select("table.candidates tbody tr td:nth-child(2) strong").eachText();
    assertThat(places)
        .as("the empty spaces offered: the first free one on each leg")
        .contains("LP-A space 4 B", "LP-A space 6 A")
        .noneMatch(place -> place.matches(".*space (1|2|3|5|8) .*"))
        // a space is on the leg of its row, never another
        .noneMatch(place -> place.matches(".*space 4 A.*|.*space 6 B.*"));
    assertThat(answer.select("table.candidates thead th").eachText())
        .as("one column per leg, named as the panel names them")
        .contains("A after (A)", "B after (A)")
        .noneMatch(text -> text.startsWith("L1") || text.startsWith("L3") || text.startsWith("C "));

    Document history = page("/boards/{id}/history", panel);
    assertThat(history.select("th").eachText())
        .as("the load history's columns: both legs")
        .contains("A after (A)", "B after (A)");
  }
}
