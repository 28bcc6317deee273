package com.wayledger.loadlog;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import com.wayledger.system.EffectiveDate;
import java.time.LocalDate;
import java.time.ZoneOffset;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.jdbc.core.simple.JdbcClient;

/**
 * A change recorded after the fact carries the day it took effect beside the time the log stamps:
 * the stamp stays the recording time, the effective day joins the entry's hash (the chain still
 * verifies), and a day after the day of recording is refused.
 */
abstract class BackDatedLogChecks {

  @Autowired SiteService sites;
  @Autowired ChangeLog log;
  @Autowired JdbcClient jdbc;

  @Test
  void backDatedEntryKeepsItsRecordingTimeAndTheChainVerifies() {
    LocalDate fitted = LocalDate.of(2021, 3, 9);
    LocalDate today = LocalDate.now(ZoneOffset.UTC);
    Site site = EffectiveDate.during(fitted, () -> sites.create(LogFixtures.site()));
    assertThat(EffectiveDate.current()).as("the day is not left behind on the thread").isNull();
    Site later = sites.create(LogFixtures.site());

    ChangeLogEntry entry = log.ofSite(site.getId(), LogFilter.ALL).get(0);
    assertThat(entry.effectiveOn()).isEqualTo(fitted);
    assertThat(entry.isBackDated()).isTrue();
    assertThat(entry.happenedAt().atOffset(ZoneOffset.UTC).toLocalDate())
        .as("recorded today, not on the effective day")
        .isAfterOrEqualTo(today.minusDays(1));
    assertThat(entry.effectiveAt()).isEqualTo(fitted.atStartOfDay(ZoneOffset.UTC).toInstant());
    assertThat(log.ofSite(later.getId(), LogFilter.ALL).get(0).isBackDated()).isFalse();
    assertThat(log.verify(site.getId()).intact()).as("chain with a back-dated entry").isTrue();
  }

  @Test
  void alteredEffectiveDayBreaksTheChain() {
    Site site =
        EffectiveDate.during(LocalDate.of(2021, 3, 9), () -> sites.create(LogFixtures.site()));
    assertThat(log.verify(site.getId()).intact()).isTrue();
    rewriteEffectiveDay(site.getId(), LocalDate.of(2019, 1, 1));
    assertThat(log.verify(site.getId()).intact())
        .as("an effective day changed after writing is found")
        .isFalse();
  }

  @Test
  void effectiveDayAfterTheDayOfRecordingIsRefused() {
    long before = jdbc.sql("SELECT COUNT(*) FROM change_log").query(Long.class).single();
    assertThatThrownBy(
            () ->
                EffectiveDate.during(
                    LocalDate.now(ZoneOffset.UTC).plusDays(2),
                    () -> sites.create(LogFixtures.site())))
        .isInstanceOf(RuntimeException.class);
    assertThat(jdbc.sql("SELECT COUNT(*) FROM change_log").query(Long.class).single())
        .as("nothing logged")
        .isEqualTo(before);
  }

  /** The change the test makes around the application (the owner's rights on PostgreSQL). */
  abstract void rewriteEffectiveDay(long siteId, LocalDate day);
}
