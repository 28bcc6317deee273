package com.wayledger.wording;

import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.stereotype.Component;

/**
 * The rule set of the site a page is about, read from the page's address: {@code /sites/7…}, {@code
 * /boards/12…}, {@code /circuits/40…}, {@code /loads/9…} and {@code /log/31…} each name one record
 * of one site. Addresses that name no site (the site list, methods, the account, the estate
 * findings) and the API give none.
 */
@Component
class SiteOfPage {

  private static final Pattern RECORD =
      Pattern.compile("^/(sites|boards|circuits|loads|log)/(\\d{1,18})(?:[/.].*)?$");

  private final JdbcClient jdbc;

  SiteOfPage(JdbcClient jdbc) {
    this.jdbc = jdbc;
  }

  /** The rule set key ("IEC", "NEC") of the site this path is about; empty when none or unknown. */
  Optional<String> ruleSetOf(String path) {
    if (path == null) {
      return Optional.empty();
    }
    Matcher m = RECORD.matcher(path);
    if (!m.matches()) {
      return Optional.empty();
    }
    long id = Long.parseLong(m.group(2));
    String sql =
        switch (m.group(1)) {
          case "sites" -> "SELECT s.rule_set FROM site s WHERE s.id = ?";
          case "boards" ->
              "SELECT s.rule_set FROM board b JOIN site s ON s.id = b.site_id WHERE b.id = ?";
          case "circuits" ->
              "SELECT s.rule_set FROM circuit c JOIN board b ON b.id = c.board_id"
                  + " JOIN site s ON s.id = b.site_id WHERE c.id = ?";
          case "loads" ->
              "SELECT s.rule_set FROM load_item l JOIN circuit c ON c.id = l.circuit_id"
                  + " JOIN board b ON b.id = c.board_id JOIN site s ON s.id = b.site_id"
                  + " WHERE l.id = ?";
          default ->
              "SELECT s.rule_set FROM change_log g JOIN site s ON s.id = g.site_id WHERE g.id = ?";
        };
    return jdbc.sql(sql).param(id).query(String.class).optional();
  }
}
