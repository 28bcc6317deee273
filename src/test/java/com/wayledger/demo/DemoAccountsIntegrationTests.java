package com.wayledger.demo;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.groups.Tuple.tuple;

import com.wayledger.account.AccountService;
import com.wayledger.account.AppUser;
import com.wayledger.account.Role;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.test.context.ActiveProfiles;

/** The demo profile creates exactly the accounts the README lists. */
@SpringBootTest
@ActiveProfiles({"test", "demo"})
class DemoAccountsIntegrationTests {

  @Autowired AccountService accounts;
  @Autowired PasswordEncoder encoder;

  @Test
  void createsTheDemoAdministratorAndTheVisitorOnly() throws IOException {
    assertThat(accounts.all())
        .extracting(AppUser::getUsername, AppUser::getRole)
        .containsExactly(tuple("demo", Role.ADMIN), tuple("visitor", Role.VIEWER));
    assertThat(encoder.matches("wayledger-demo", accounts.all().get(0).getPasswordHash())).isTrue();
    assertThat(encoder.matches("wayledger-visit", accounts.all().get(1).getPasswordHash()))
        .isTrue();
    String readme = Files.readString(Path.of("README.md"));
    assertThat(readme)
        .contains("| `demo` | `wayledger-demo` |", "| `visitor` | `wayledger-visit` |");
  }
}
