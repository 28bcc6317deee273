package com.wayledger.system;

import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.boot.context.event.ApplicationReadyEvent;
import org.springframework.context.event.EventListener;
import org.springframework.core.env.Environment;
import org.springframework.stereotype.Component;

/** Prints where the app answers, and in the demo profile how to sign in. */
@Component
class StartupBanner {

  private static final Logger LOG = LoggerFactory.getLogger(StartupBanner.class);

  private final Environment environment;
  private final boolean demo;
  private final String adminUsername;

  StartupBanner(
      Environment environment,
      @Value("${wayledger.demo.enabled:false}") boolean demo,
      @Value("${wayledger.admin.username:}") String adminUsername) {
    this.environment = environment;
    this.demo = demo;
    this.adminUsername = adminUsername;
  }

  @EventListener(ApplicationReadyEvent.class)
  void announce() {
    String port = environment.getProperty("local.server.port", "8080");
    LOG.info("Wayledger is ready at http://localhost:{}/", port);
    if (demo && !adminUsername.isBlank()) {
      LOG.info(
          "Demo sign-in: the administrator '{}' from WAYLEDGER_ADMIN_USERNAME / _PASSWORD;"
              + " user 'visitor', password 'wayledger-visit' (read only).",
          adminUsername.strip());
    } else if (demo) {
      LOG.info(
          "Demo sign-in: user 'demo', password 'wayledger-demo' (editor and admin);"
              + " user 'visitor', password 'wayledger-visit' (read only).");
    }
  }
}
