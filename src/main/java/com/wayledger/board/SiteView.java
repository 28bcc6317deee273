package com.wayledger.board;

import com.wayledger.engine.SupplySystem;
import com.wayledger.site.Site;

/**
 * The site of a board page as the page prints it (crumbs, title, the layout's rule-set line): plain
 * values, kept with the page's view after the transaction that read them.
 *
 * @param id the site's id (links)
 * @param name its name
 * @param ruleSet the key of the rule set it is checked against
 * @param supplySystem its supply system
 */
public record SiteView(long id, String name, String ruleSet, SupplySystem supplySystem) {

  static SiteView of(Site site) {
    return new SiteView(site.getId(), site.getName(), site.getRuleSet(), site.getSupplySystem());
  }
}
