package com.wayledger.demo;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.groups.Tuple.tuple;

import com.wayledger.account.AccountService;
import com.wayledger.account.AppUser;
import com.wayledger.account.Role;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.test.context.ActiveProfiles;

/**
 * The demo profile honours WAYLEDGER_ADMIN_USERNAME / _PASSWORD (here as the properties they set):
 * that account replaces the demo administrator, and the visitor is still created.
 */
@SpringBootTest(
    properties = {
      "wayledger.admin.username=site-keeper",
      "wayledger.admin.password=keeper-of-the-boards-9"
    })
@ActiveProfiles({"test", "demo"})
class DemoAdminVariablesIntegrationTests {

  @Autowired AccountService accounts;
  @Autowired PasswordEncoder encoder;

  @Test
  void theNamedAdministratorReplacesDemo() {
    assertThat(accounts.all())
        .extracting(AppUser::getUsername, AppUser::getRole)
        .containsExactly(tuple("site-keeper", Role.ADMIN), tuple("visitor", Role.VIEWER));
    assertThat(encoder.matches("keeper-of-the-boards-9", accounts.all().get(0).getPasswordHash()))
        .isTrue();
  }
}
