package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.board.Circuit;
import com.wayledger.board.CircuitRepository;
import com.wayledger.board.ScheduleService;
import com.wayledger.engine.WayStatus;
import com.wayledger.loadlog.ChangeLog;
import com.wayledger.site.SiteService;
import com.wayledger.support.QrImages;
import java.nio.charset.StandardCharsets;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.RequestPostProcessor;

/**
 * The door chart's code and the live page it opens, on the demo site, with the public base address
 * set as a proxy deployment would set it.
 */
@SpringBootTest(properties = "wayledger.public-base-url=https://ledger.example.org/wl/")
@AutoConfigureMockMvc
@ActiveProfiles({"test", "demo"})
class DoorChartIntegrationTests {

  static final RequestPostProcessor VIEWER = user("vi").roles("VIEWER");
  static final Pattern CODE =
      Pattern.compile("(<svg[^>]*class=\"door-code\".*?</svg>)", Pattern.DOTALL);
  static final Pattern LINK = Pattern.compile("data-link=\"([^\"]+)\"");

  @Autowired MockMvc mvc;
  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired ScheduleService schedule;
  @Autowired ChangeLog log;
  @Autowired CircuitRepository circuits;

  private Board demoBoard(String reference) {
    long siteId =
        sites.all().stream()
            .filter(site -> site.getName().equals("Tallow Lane Works"))
            .findFirst()
            .orElseThrow()
            .getId();
    return boards.onSite(siteId).stream()
        .filter(board -> board.getReference().equals(reference))
        .findFirst()
        .orElseThrow();
  }

  private String page(String path) throws Exception {
    return mvc.perform(get(path).with(VIEWER))
        .andExpect(status().isOk())
        .andReturn()
        .getResponse()
        .getContentAsString(StandardCharsets.UTF_8);
  }

  @Test
  void codeOnTheChartDecodesToTheLiveLinkAtTheSetBaseAddress() throws Exception {
    Board board = demoBoard("FLAT-1");
    String chart = page("/boards/" + board.getId() + "/door-chart");

    Matcher svg = CODE.matcher(chart);
    Matcher link = LINK.matcher(chart);
    assertThat(svg.find()).as("a QR code on the chart").isTrue();
    assertThat(link.find()).isTrue();
    String expected =
        "https://ledger.example.org/wl/boards/"
            + board.getId()
            + "/live?printed="
            + LocalDate.now(ZoneOffset.UTC)
            + "&at="
            + log.latestPosition(board.getId());
    assertThat(link.group(1).replace("&amp;", "&")).isEqualTo(expected);
    assertThat(QrImages.decodeSvg(svg.group(1))).as("what a phone reads").isEqualTo(expected);
    assertThat(chart).contains("Free positions").contains("Figures here assist");
    assertThat(chart)
        .as("no inline style or handler")
        .doesNotContain("<style")
        .doesNotContain("onclick");
  }

  @Test
  void liveLinkSaysUnchangedThenWhatChangedAfterAnEdit() throws Exception {
    Board board = demoBoard("KB1");
    long printedAt = log.latestPosition(board.getId());
    String path = "/boards/" + board.getId() + "/live?printed=2026-01-05&at=" + printedAt;

    assertThat(page(path))
        .contains("Unchanged since printed on 2026-01-05")
        .doesNotContain("Changed since printed");

    Circuit spare =
        circuits.findByBoard(board.getId()).stream()
            .filter(circuit -> circuit.getStatus() == WayStatus.SPARE_DEVICE)
            .findFirst()
            .orElseThrow();
    schedule.deleteCircuit(spare.getId(), "taken out for the test");

    String after = page(path);
    assertThat(after)
        .contains("Changed since printed on 2026-01-05: 1 change(s)")
        .contains("taken out for the test");
  }

  @Test
  void damagedOrForeignLinkStillShowsTheBoardAndSaysSo() throws Exception {
    Board board = demoBoard("LL");
    assertThat(page("/boards/" + board.getId() + "/live?printed=yesterday&at=x"))
        .contains("could not be read")
        .doesNotContain("live-banner");
    assertThat(page("/boards/" + board.getId() + "/live?at=99999999"))
        .contains("only reaches " + log.latestPosition(board.getId()));
  }
}
