package com.wayledger.demo;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.loadlog.ChangeLog;
import com.wayledger.loadlog.ChangeLogEntry;
import com.wayledger.loadlog.DemandHistoryChart;
import com.wayledger.loadlog.HistoryPoint;
import com.wayledger.loadlog.HistoryService;
import com.wayledger.loadlog.LogFilter;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.test.context.ActiveProfiles;

/**
 * The demo site's change log tells a story over several years (installation, then additions in
 * later years), each entry back-dated to the day it took effect beside the day it was recorded, so
 * that board history and demand over time show more than a flat line.
 */
@SpringBootTest
@ActiveProfiles({"test", "demo"})
class DemoHistoryIntegrationTests {

  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired ChangeLog log;
  @Autowired HistoryService history;

  Site site;

  @BeforeEach
  void demoSite() {
    site =
        sites.all().stream()
            .filter(s -> s.getName().equals(DemoSite.SITE_NAME))
            .findFirst()
            .orElseThrow();
  }

  @Test
  void siteHistorySpansAtLeastThreeYears() {
    List<ChangeLogEntry> entries = log.ofSite(site.getId(), LogFilter.ALL);
    Set<Integer> years =
        entries.stream()
            .map(e -> e.effectiveAt().atOffset(ZoneOffset.UTC).getYear())
            .collect(Collectors.toCollection(TreeSet::new));
    assertThat(years).as("years the demo's changes took effect").hasSizeGreaterThanOrEqualTo(3);
    assertThat(entries)
        .as("every back-dated entry is recorded on or after the day it took effect")
        .filteredOn(ChangeLogEntry::isBackDated)
        .isNotEmpty()
        .allSatisfy(
            e ->
                assertThat(e.happenedAt().atOffset(ZoneOffset.UTC).toLocalDate())
                    .isAfterOrEqualTo(e.effectiveOn()));
    assertThat(log.verify(site.getId()).intact()).as("the chain verifies").isTrue();
  }

  @Test
  void bakeryDemandOverTimeHasMoreThanOneValueAcrossYears() {
    Board bakery = board("KB1");
    List<HistoryPoint> points = history.points(bakery.getId());
    DemandHistoryChart chart = history.chart(bakery.getId(), points);
    Set<Double> highest =
        chart.steps().stream()
            .map(
                step ->
                    step.phaseCurrentsAmps().values().stream()
                        .filter(Objects::nonNull)
                        .max(Double::compare)
                        .orElse(0.0))
            .collect(Collectors.toSet());
    assertThat(highest).as("distinct highest phase demand drawn").hasSizeGreaterThan(1);
    Set<Integer> years =
        chart.steps().stream()
            .map(step -> step.at().atOffset(ZoneOffset.UTC).getYear())
            .collect(Collectors.toSet());
    assertThat(years).as("years on the bakery board's chart").hasSizeGreaterThanOrEqualTo(3);
    assertThat(points)
        .as("points in the order the changes took effect")
        .isSortedAccordingTo(java.util.Comparator.comparing(HistoryPoint::at));
  }

  private Board board(String reference) {
    return boards.onSite(site.getId()).stream()
        .filter(b -> b.getReference().equals(reference))
        .findFirst()
        .orElseThrow();
  }
}
