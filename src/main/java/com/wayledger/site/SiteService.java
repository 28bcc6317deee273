package com.wayledger.site;

import com.wayledger.diversity.MethodLibrary;
import com.wayledger.system.ChangeKind;
import com.wayledger.system.NotFoundException;
import com.wayledger.system.RowLocks;
import com.wayledger.system.RuleViolation;
import com.wayledger.system.ScheduleChanged;
import com.wayledger.system.StaleEditException;
import java.util.List;
import java.util.Objects;
import org.springframework.context.ApplicationEventPublisher;
import org.springframework.data.domain.Page;
import org.springframework.data.domain.PageRequest;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Creates, edits and finds sites; the rules that a form alone cannot check live here. Each change
 * publishes a {@link ScheduleChanged} event for the change log (the snapshots are the site forms
 * before and after).
 */
@Service
public class SiteService {

  private final JdbcClient jdbc;
  private final SiteRepository sites;
  private final MethodLibrary methods;
  private final ApplicationEventPublisher events;
  private final RowLocks locks;

  public SiteService(
      SiteRepository sites,
      MethodLibrary methods,
      ApplicationEventPublisher events,
      RowLocks locks,
      JdbcClient jdbc) {
    this.jdbc = jdbc;
    this.sites = sites;
    this.methods = methods;
    this.events = events;
    this.locks = locks;
  }

  @Transactional(readOnly = true)
  public List<Site> all() {
    return sites.findAllByOrderByNameAsc();
  }

  /** Sites shown on one page of the site list. */
  public static final int PAGE_SIZE = 50;

  /**
   * One page of the sites, by name; with a search text, only the sites whose name or address
   * contains it, or that hold a board whose reference contains it (ignoring case).
   */
  @Transactional(readOnly = true)
  public Page<Site> page(String text, int page) {
    PageRequest request = PageRequest.of(Math.max(0, page), PAGE_SIZE);
    String wanted = text == null ? "" : text.strip().toLowerCase(java.util.Locale.ROOT);
    if (wanted.isEmpty()) {
      return sites.pageByName(request);
    }
    String escaped = wanted.replace("\\", "\\\\").replace("%", "\\%").replace("_", "\\_");
    return sites.search("%" + escaped + "%", request);
  }

  @Transactional(readOnly = true)
  public Site get(long id) {
    return sites.findById(id).orElseThrow(() -> new NotFoundException("Site", id));
  }

  @Transactional
  public Site create(SiteForm form) {
    form = form.normalised();
    checkRules(form, null);
    Site site = new Site(form.name());
    site.apply(form);
    Site saved = sites.saveAndFlush(site);
    logged(saved, ChangeKind.SITE_ADDED, "added", null, SiteForm.of(saved), null);
    return saved;
  }

  @Transactional
  public Site update(long id, SiteForm form) {
    return update(id, form, null);
  }

  @Transactional
  public Site update(long id, SiteForm form, String reason) {
    // Exclusive: a board being added or edited meanwhile (it holds the site shared) finishes first,
    // so a check of the site's boards made here sees it.
    if (!locks.exclusive("site", id)) {
      throw new NotFoundException("Site", id);
    }
    Site site = get(id);
    if (form.version() != null && !Objects.equals(form.version(), site.getVersion())) {
      throw new StaleEditException("Site " + site.getName(), SiteForm.of(site));
    }
    if (form.ruleSet() != null
        && !form.ruleSet().isBlank()
        && !form.ruleSet().strip().equals(site.getRuleSet())) {
      throw new RuleViolation("ruleSet", "site.ruleSet.fixed");
    }
    form =
        new SiteForm(
                form.name(),
                form.address(),
                form.earthingSystem(),
                form.nominalVoltageVolts(),
                form.phases(),
                form.frequencyHertz(),
                form.externalLoopImpedanceOhms(),
                form.prospectiveFaultCurrentKiloAmps(),
                form.supplyFuseRatingAmps(),
                form.defaultDiversityMethod(),
                form.notes(),
                form.version(),
                form.loadingThresholdPercent(),
                site.getRuleSet(),
                form.supplySystem() == null ? site.getSupplySystem() : form.supplySystem())
            .normalised();
    checkRules(form, id);
    if (form.phases() == 1 && site.getPhases() != 1) {
      // Consistency across the site: a single-phase supply cannot feed three-phase boards. The
      // boards are read through the table (the board feature depends on this one, not back).
      List<String> threePhase =
          jdbc.sql(
                  "SELECT reference FROM board WHERE site_id = ? AND phases = 3 ORDER BY reference")
              .param(id)
              .query(String.class)
              .list();
      if (!threePhase.isEmpty()) {
        throw new RuleViolation(
            "phases", "site.phases.boardsThreePhase", String.join(", ", threePhase));
      }
    }
    SiteForm before = SiteForm.of(site);
    site.apply(form);
    Site saved = sites.saveAndFlush(site);
    logged(saved, ChangeKind.SITE_EDITED, "changed", before, SiteForm.of(saved), reason);
    return saved;
  }

  /**
   * Replaces the site's defaults (cable conditions, start-up multiples) that its circuits inherit;
   * recorded in the change log unless nothing changed.
   */
  @Transactional
  public Site updateDefaults(long id, DefaultsForm form, String reason) {
    Site site = get(id);
    DefaultsForm before = DefaultsForm.of(site.getDefaults(), site.getStartUpMultiples());
    if (before.equals(form)) {
      return site;
    }
    SiteForm header = SiteForm.of(site);
    site.applyDefaults(form);
    Site saved = sites.saveAndFlush(site);
    String what =
        "defaults changed: "
            + com.wayledger.system.RecordDiff.describe(
                com.wayledger.system.RecordDiff.between(before, form, java.util.Set.of()),
                "defaults",
                6);
    logged(saved, ChangeKind.SITE_EDITED, what, header, SiteForm.of(saved), reason);
    return saved;
  }

  private void logged(
      Site site, ChangeKind kind, String what, Object before, Object after, String reason) {
    events.publishEvent(
        new ScheduleChanged(
            site.getId(),
            null,
            null,
            kind,
            "Site “" + site.getName() + "”: " + what,
            before,
            after,
            reason));
  }

  private void checkRules(SiteForm form, Long id) {
    java.util.Optional<com.wayledger.engine.rules.RuleSet> ruleSet =
        com.wayledger.engine.rules.RuleSets.find(form.ruleSetOrDefault());
    if (ruleSet.isEmpty()) {
      throw new RuleViolation("ruleSet", "site.ruleSet.unknown");
    }
    if (!ruleSet.get().supplySystems().contains(form.supplySystem())) {
      throw new RuleViolation("supplySystem", "site.supplySystem.notOfRuleSet");
    }
    if (form.phases() != 1 && form.phases() != 3) {
      throw new RuleViolation("phases", "site.phases.invalid");
    }
    if (form.frequencyHertz() != 50.0 && form.frequencyHertz() != 60.0) {
      throw new RuleViolation("frequencyHertz", "site.frequency.invalid");
    }
    if (form.defaultDiversityMethod() != null
        && !form.defaultDiversityMethod().isBlank()
        && methods.catalog().find(form.defaultDiversityMethod()).isEmpty()) {
      throw new RuleViolation("defaultDiversityMethod", "method.unknown");
    }
    String name = form.name().strip();
    boolean taken =
        id == null
            ? sites.existsByNameIgnoreCase(name)
            : sites.existsByNameIgnoreCaseAndIdNot(name, id);
    if (taken) {
      throw new RuleViolation("name", "site.name.taken");
    }
  }
}
