package com.wayledger.account;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatCode;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.wayledger.system.RuleViolation;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The password policy for new accounts and its shipped list of common passwords. */
class PasswordPolicyTests {

  @Test
  void theShippedListIsLoaded() {
    assertThat(PasswordPolicy.listSize()).isGreaterThan(150);
  }

  @ParameterizedTest
  @CsvSource({
    "nia, short9chr, user.password.length",
    "nia, Password123!, user.password.common",
    "nia, QWERTYUIOP, user.password.common",
    "nia, 1234567890, user.password.common",
    "nia, welcome2025, user.password.common",
    "oskar-lind, Oskar-Lind2026!, user.password.username",
    "nia, abababababab, user.password.repetitive"
  })
  void refusedPasswords(String username, String password, String code) {
    assertThatThrownBy(() -> PasswordPolicy.check(username, password))
        .isInstanceOf(RuleViolation.class)
        .extracting(e -> ((RuleViolation) e).messageCode())
        .isEqualTo(code);
  }

  @ParameterizedTest
  @CsvSource({"nia, long-enough-secret", "demo, wayledger-demo", "chief, ten-or-more-chars"})
  void acceptedPasswords(String username, String password) {
    assertThatCode(() -> PasswordPolicy.check(username, password)).doesNotThrowAnyException();
  }
}
