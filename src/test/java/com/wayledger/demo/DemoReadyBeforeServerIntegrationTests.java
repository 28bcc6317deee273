package com.wayledger.demo;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.account.AccountService;
import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.inspection.InspectionService;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.context.SpringBootTest.WebEnvironment;
import org.springframework.boot.test.context.TestConfiguration;
import org.springframework.boot.web.server.context.WebServerInitializedEvent;
import org.springframework.context.annotation.Import;
import org.springframework.context.event.EventListener;
import org.springframework.test.context.ActiveProfiles;

/**
 * The demo data are complete before the first page is served: what the database holds at the moment
 * the web server has started (and may answer its first request) is every demo account, both demo
 * sites and the two inspections of the flat board, not only what has arrived so far.
 */
@SpringBootTest(webEnvironment = WebEnvironment.RANDOM_PORT)
@ActiveProfiles({"test", "demo"})
@Import(DemoReadyBeforeServerIntegrationTests.AtServerStart.class)
class DemoReadyBeforeServerIntegrationTests {

  @Autowired AtServerStart atServerStart;

  @Test
  void demoAccountsSitesAndInspectionsAreStoredWhenTheServerStarts() {
    assertThat(atServerStart.recorded).as("the web server started event was seen").isTrue();
    assertThat(atServerStart.accounts).as("demo accounts when the server started").isEqualTo(2);
    assertThat(atServerStart.siteNames)
        .as("sites when the server started")
        .contains(DemoSite.SITE_NAME, NecDemoSite.SITE_NAME);
    assertThat(atServerStart.flatOneInspections)
        .as("inspections of " + DemoInspections.BOARD + " when the server started")
        .isEqualTo(2);
  }

  /** Reads the database in the web server's own start-up event, before any request is answered. */
  @TestConfiguration
  static class AtServerStart {

    private final AccountService accountService;
    private final SiteService sites;
    private final BoardService boards;
    private final InspectionService inspections;

    volatile boolean recorded;
    volatile int accounts;
    volatile List<String> siteNames = List.of();
    volatile int flatOneInspections = -1;

    AtServerStart(
        AccountService accountService,
        SiteService sites,
        BoardService boards,
        InspectionService inspections) {
      this.accountService = accountService;
      this.sites = sites;
      this.boards = boards;
      this.inspections = inspections;
    }

    @EventListener(WebServerInitializedEvent.class)
    void record() {
      accounts = accountService.all().size();
      List<Site> all = sites.all();
      siteNames = all.stream().map(Site::getName).toList();
      flatOneInspections =
          all.stream()
              .filter(site -> site.getName().equals(DemoSite.SITE_NAME))
              .flatMap(site -> boards.onSite(site.getId()).stream())
              .filter(board -> board.getReference().equals(DemoInspections.BOARD))
              .map(Board::getId)
              .mapToInt(id -> inspections.ofBoard(id).size())
              .sum();
      recorded = true;
    }
  }
}
