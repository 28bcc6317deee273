package com.wayledger.account;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;

import java.util.UUID;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.system.CapturedOutput;
import org.springframework.boot.test.system.OutputCaptureExtension;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.RequestPostProcessor;

/**
 * Sign-in throttling through the real filter chains: the sign-in form and HTTP Basic on the API
 * share one count per name and per address, a locked name is refused even with the right password,
 * an unknown name is locked exactly like a real one, and each lock-out is logged.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
@ExtendWith(OutputCaptureExtension.class)
class SignInThrottleIntegrationTests {

  private static final String PASSWORD = "throttle-secret-58";

  @Autowired MockMvc mvc;
  @Autowired AccountService accounts;

  private String realUser() {
    String name = "thr-" + UUID.randomUUID().toString().substring(0, 8);
    accounts.create(new UserForm(name, "Throttle test", PASSWORD, Role.EDITOR));
    return name;
  }

  private static RequestPostProcessor from(String address) {
    return request -> {
      request.setRemoteAddr(address);
      return request;
    };
  }

  private String formSignIn(String user, String password, String address) throws Exception {
    return mvc.perform(
            post("/login")
                .param("username", user)
                .param("password", password)
                .with(csrf())
                .with(from(address)))
        .andReturn()
        .getResponse()
        .getRedirectedUrl();
  }

  private int basic(String user, String password, String address) throws Exception {
    return mvc.perform(get("/api/sites").with(httpBasic(user, password)).with(from(address)))
        .andReturn()
        .getResponse()
        .getStatus();
  }

  @Test
  void formLocksARealAndAnUnknownNameAlikeAndLogsIt(CapturedOutput log) throws Exception {
    String real = realUser();
    String unknown = "nobody-" + UUID.randomUUID().toString().substring(0, 8);
    for (String name : new String[] {real, unknown}) {
      for (int i = 0; i < SignInThrottle.ACCOUNT_LIMIT; i++) {
        assertThat(formSignIn(name, "wrong-password-" + i, "10.20.0." + i))
            .isEqualTo("/login?error");
      }
      assertThat(formSignIn(name, PASSWORD, "10.20.1.1"))
          .as("locked, even with the right password, and the same answer for both names")
          .isEqualTo("/login?locked");
    }
    assertThat(log.getOut()).contains("Sign-in locked for account '" + real + "'");
    assertThat(log.getOut()).contains("Sign-in locked for account '" + unknown + "'");
    String other = realUser();
    assertThat(formSignIn(other, PASSWORD, "10.20.1.1")).isEqualTo("/sites");
  }

  @Test
  void httpBasicSharesTheCountAndIsRefusedWhileLocked() throws Exception {
    String real = realUser();
    assertThat(basic(real, PASSWORD, "10.30.0.1")).isEqualTo(200);
    for (int i = 0; i < SignInThrottle.ACCOUNT_LIMIT - 1; i++) {
      assertThat(basic(real, "wrong-" + i, "10.30.0.2")).isEqualTo(401);
    }
    assertThat(formSignIn(real, "wrong-on-the-form", "10.30.0.3")).isEqualTo("/login?error");
    assertThat(basic(real, PASSWORD, "10.30.0.4"))
        .as("locked by form + Basic failures")
        .isEqualTo(401);
  }

  @Test
  void oneAddressGuessingManyNamesIsLockedForEveryName() throws Exception {
    String real = realUser();
    for (int i = 0; i < SignInThrottle.ADDRESS_LIMIT; i++) {
      basic("guess-" + i + "-" + UUID.randomUUID(), "password-guess", "10.40.0.9");
    }
    assertThat(basic(real, PASSWORD, "10.40.0.9")).isEqualTo(401);
    assertThat(formSignIn(real, PASSWORD, "10.40.0.9")).isEqualTo("/login?locked");
    assertThat(basic(real, PASSWORD, "10.40.0.10")).as("another address").isEqualTo(200);
  }

  @Test
  void weakPasswordsAreRefusedForNewAccounts() {
    org.assertj.core.api.Assertions.assertThatThrownBy(
            () -> accounts.create(new UserForm("weak-one", "Weak", "Password2025", Role.VIEWER)))
        .hasMessageContaining("user.password.common");
  }
}
