package com.wayledger.account;

import com.wayledger.system.StaleEditException;
import java.util.Optional;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Each user's interface language, stored with the user and carrying a version of its own: a choice
 * saved from a page opened before someone else's change is refused, and nothing else of the account
 * moves with it.
 */
@Service
public class UserLanguages {

  private final JdbcClient jdbc;

  public UserLanguages(JdbcClient jdbc) {
    this.jdbc = jdbc;
  }

  /** The user's choice as the account form shows it, with its version. */
  @Transactional(readOnly = true)
  public LanguageForm formOf(String username) {
    return jdbc.sql(
            "SELECT interface_language, interface_language_version FROM app_user WHERE username = ?")
        .param(username)
        .query(
            (row, n) ->
                new LanguageForm(
                    InterfaceLanguage.valueOf(row.getString("interface_language")),
                    row.getLong("interface_language_version")))
        .optional()
        .orElse(new LanguageForm(InterfaceLanguage.FOLLOW_SITE, 0L));
  }

  /** The user's choice; empty for an unknown user (signed out, or removed meanwhile). */
  @Transactional(readOnly = true)
  public Optional<InterfaceLanguage> of(String username) {
    return jdbc.sql("SELECT interface_language FROM app_user WHERE username = ?")
        .param(username)
        .query((row, n) -> InterfaceLanguage.valueOf(row.getString(1)))
        .optional();
  }

  /**
   * Stores the choice if the stored version is still the one the form was opened at.
   *
   * @throws StaleEditException when it was changed meanwhile; nothing is stored then
   */
  @Transactional
  public void choose(String username, LanguageForm form) {
    int changed =
        jdbc.sql(
                "UPDATE app_user SET interface_language = ?,"
                    + " interface_language_version = interface_language_version + 1"
                    + " WHERE username = ? AND interface_language_version = ?")
            .params(form.language().name(), username, form.version())
            .update();
    if (changed == 0) {
      throw new StaleEditException("Your interface language", formOf(username));
    }
  }
}
