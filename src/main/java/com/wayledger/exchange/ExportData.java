package com.wayledger.exchange;

import com.wayledger.engine.demand.SiteDemand;
import com.wayledger.engine.protection.SiteFindings;
import java.time.LocalDate;
import java.util.List;

/**
 * Everything an export writes, read in one transaction: the site's facts, the boards to write (in
 * tree order) with their circuits and loads, and the engine's figures for the whole site.
 *
 * @param siteId the site
 * @param siteName its name
 * @param earthing earthing system as text
 * @param boards the boards to write, each parent before its children
 * @param demand the demand engine's result for the whole site
 * @param findings the protection engine's result for the whole site
 * @param exportedOn the date printed on every sheet
 */
public record ExportData(
    long siteId,
    String siteName,
    String earthing,
    List<BoardEntry> boards,
    SiteDemand demand,
    SiteFindings findings,
    LocalDate exportedOn,
    String ruleSetTitle,
    String supplySystemWords,
    com.wayledger.engine.rules.CableUnits cableUnits) {

  public ExportData {
    boards = List.copyOf(boards);
    if (ruleSetTitle == null) {
      ruleSetTitle = com.wayledger.engine.rules.RuleSets.IEC.title();
    }
    if (supplySystemWords == null) {
      supplySystemWords = "";
    }
    if (cableUnits == null) {
      cableUnits = com.wayledger.engine.rules.CableUnits.METRIC;
    }
  }

  /** Export data in mm² and metres (the argument list from before units followed the site). */
  public ExportData(
      long siteId,
      String siteName,
      String earthing,
      List<BoardEntry> boards,
      SiteDemand demand,
      SiteFindings findings,
      LocalDate exportedOn,
      String ruleSetTitle,
      String supplySystemWords) {
    this(
        siteId,
        siteName,
        earthing,
        boards,
        demand,
        findings,
        exportedOn,
        ruleSetTitle,
        supplySystemWords,
        null);
  }

  /** Export data without the supply system in words (the argument list from before it). */
  public ExportData(
      long siteId,
      String siteName,
      String earthing,
      List<BoardEntry> boards,
      SiteDemand demand,
      SiteFindings findings,
      LocalDate exportedOn,
      String ruleSetTitle) {
    this(siteId, siteName, earthing, boards, demand, findings, exportedOn, ruleSetTitle, null);
  }

  /** Export data of an IEC site (the argument list from before rule sets). */
  public ExportData(
      long siteId,
      String siteName,
      String earthing,
      List<BoardEntry> boards,
      SiteDemand demand,
      SiteFindings findings,
      LocalDate exportedOn) {
    this(siteId, siteName, earthing, boards, demand, findings, exportedOn, null, null);
  }
}
