package com.wayledger.demo;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.account.AccountService;
import com.wayledger.account.AppUser;
import com.wayledger.account.Role;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.test.context.ActiveProfiles;

/**
 * The demo profile creates exactly the accounts the README lists, and honours WAYLEDGER_ADMIN_*.
 */
class DemoAccountsIntegrationTests {

  @Nested
  @SpringBootTest
  @ActiveProfiles({"test", "demo"})
  class Default {
    @Autowired AccountService accounts;
    @Autowired PasswordEncoder encoder;

    @Test
    void createsDemoAdminAndVisitorOnly() throws IOException {
      assertThat(accounts.all())
          .extracting(AppUser::getUsername, AppUser::getRole)
          .containsExactly(
              org.assertj.core.groups.Tuple.tuple("demo", Role.ADMIN),
              org.assertj.core.groups.Tuple.tuple("visitor", Role.VIEWER));
      AppUser demo = accounts.all().get(0);
      assertThat(encoder.matches("wayledger-demo", demo.getPasswordHash())).isTrue();
      String readme = Files.readString(Path.of("README.md"));
      assertThat(readme)
          .contains("| `demo` | `wayledger-demo` |", "| `visitor` | `wayledger-visit` |");
    }
  }

  @Nested
  @SpringBootTest(
      properties = {
        "wayledger.admin.username=site-keeper",
        "wayledger.admin.password=keeper-of-the-boards-9"
      })
  @ActiveProfiles({"test", "demo"})
  class WithAdminVariables {
    @Autowired AccountService accounts;
    @Autowired PasswordEncoder encoder;

    @Test
    void theNamedAdministratorReplacesDemo() {
      assertThat(accounts.all())
          .extracting(AppUser::getUsername, AppUser::getRole)
          .containsExactly(
              org.assertj.core.groups.Tuple.tuple("site-keeper", Role.ADMIN),
              org.assertj.core.groups.Tuple.tuple("visitor", Role.VIEWER));
      assertThat(encoder.matches("keeper-of-the-boards-9", accounts.all().get(0).getPasswordHash()))
          .isTrue();
    }
  }
}
