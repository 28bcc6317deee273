package com.wayledger.site;

import static com.wayledger.support.Roles.viewer;
import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.board.BoardForm;
import com.wayledger.board.BoardService;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.EarthingSystem;
import java.util.UUID;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.data.domain.Page;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;

/** The site list is paged and searched by site name, address and board reference. */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class SiteSearchIntegrationTests {

  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired MockMvc mvc;

  private final String tag = UUID.randomUUID().toString().substring(0, 8);

  @Test
  void findsBySiteNameAddressOrBoardReferenceIgnoringCase() {
    Site byName = sites.create(form("Quay " + tag + " North", "1 Invented Row"));
    Site byAddress = sites.create(form("Harbour depot " + UUID.randomUUID(), "Unit " + tag));
    Site byBoard = sites.create(form("Mill " + UUID.randomUUID(), null));
    boards.create(byBoard.getId(), board("DB-" + tag.toUpperCase()));
    sites.create(form("Elsewhere " + UUID.randomUUID(), "Nowhere"));

    Page<Site> found = sites.page(tag.toUpperCase(), 0);

    assertThat(found.getContent())
        .extracting(Site::getId)
        .containsExactlyInAnyOrder(byName.getId(), byAddress.getId(), byBoard.getId());
  }

  @Test
  void aPercentSignIsSearchedForLiterallyNotAsAWildcard() {
    sites.create(form("Depot " + tag + " A", null));

    assertThat(sites.page(tag + "%", 0).getTotalElements()).isZero();
    assertThat(sites.page(tag, 0).getTotalElements()).isEqualTo(1);
  }

  @Test
  void listsFiftySitesAPageByName() throws Exception {
    for (int i = 1; i <= SiteService.PAGE_SIZE + 3; i++) {
      sites.create(form(String.format("Paged %s %03d", tag, i), null));
    }

    Page<Site> second = sites.page("Paged " + tag, 1);

    assertThat(second.getTotalElements()).isEqualTo(SiteService.PAGE_SIZE + 3);
    assertThat(second.getContent()).extracting(Site::getName).hasSize(3);
    assertThat(second.getContent().get(0).getName()).endsWith(String.format("%03d", 51));
    String page =
        mvc.perform(get("/sites").param("q", "paged " + tag).param("page", "1").with(viewer()))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(page)
        .contains("Sites 51–53 of 53")
        .contains("rel=\"prev\"")
        .doesNotContain("rel=\"next\"");
  }

  private static SiteForm form(String name, String address) {
    return new SiteForm(
        name, address, EarthingSystem.TN_S, 230.0, 3, 50.0, null, null, null, null, null, null);
  }

  private static BoardForm board(String reference) {
    return new BoardForm(
        reference,
        "Plant room",
        3,
        6,
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
}
