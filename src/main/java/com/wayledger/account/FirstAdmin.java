package com.wayledger.account;

import com.wayledger.system.RuleViolation;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.boot.ApplicationArguments;
import org.springframework.boot.ApplicationRunner;
import org.springframework.core.annotation.Order;
import org.springframework.dao.DataIntegrityViolationException;
import org.springframework.stereotype.Component;

/**
 * Outside the demo there is no default password: when no user exists, the first admin is created
 * from WAYLEDGER_ADMIN_USERNAME and WAYLEDGER_ADMIN_PASSWORD, or the log says how to create one.
 */
@Component
@Order(10)
class FirstAdmin implements ApplicationRunner {

  private static final Logger LOG = LoggerFactory.getLogger(FirstAdmin.class);

  private final AccountService accounts;
  private final String username;
  private final String password;

  FirstAdmin(
      AccountService accounts,
      @Value("${wayledger.admin.username:}") String username,
      @Value("${wayledger.admin.password:}") String password) {
    this.accounts = accounts;
    this.username = username;
    this.password = password;
  }

  @Override
  public void run(ApplicationArguments args) {
    if (accounts.anyUser()) {
      return;
    }
    if (username.isBlank() || password.isBlank()) {
      LOG.warn(
          "No user exists. Set WAYLEDGER_ADMIN_USERNAME and WAYLEDGER_ADMIN_PASSWORD (10 characters or more)"
              + " and restart to create the first administrator.");
      return;
    }
    if (password.length() < 10) {
      LOG.error(
          "WAYLEDGER_ADMIN_PASSWORD is shorter than 10 characters; no administrator was created.");
      return;
    }
    try {
      accounts.create(new UserForm(username, username, password, Role.ADMIN));
      LOG.info("Created the first administrator '{}'.", username);
    } catch (RuleViolation refused) {
      if ("password".equals(refused.field())) {
        LOG.error(
            "WAYLEDGER_ADMIN_PASSWORD is refused by the password policy ({}); no administrator was"
                + " created. Choose a longer, less common password.",
            refused.messageCode());
        return;
      }
      LOG.info("The first administrator '{}' was created by another instance.", username);
    } catch (DataIntegrityViolationException createdElsewhere) {
      // Two replicas starting together on one database: the other one created the administrator
      // first.
      LOG.info("The first administrator '{}' was created by another instance.", username);
    }
  }
}
