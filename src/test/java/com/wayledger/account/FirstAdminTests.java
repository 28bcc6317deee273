package com.wayledger.account;

import static org.assertj.core.api.Assertions.assertThatCode;
import static org.mockito.ArgumentMatchers.any;
import static org.mockito.BDDMockito.given;
import static org.mockito.Mockito.mock;
import static org.mockito.Mockito.never;
import static org.mockito.Mockito.verify;

import com.wayledger.system.RuleViolation;
import org.junit.jupiter.api.Test;
import org.springframework.boot.DefaultApplicationArguments;
import org.springframework.dao.DataIntegrityViolationException;

/** The first administrator from environment variables, also when two replicas start at once. */
class FirstAdminTests {

  private final AccountService accounts = mock(AccountService.class);

  @Test
  void createsTheAdministratorWhenNoUserExists() {
    new FirstAdmin(accounts, "chief", "ten-or-more-chars").run(new DefaultApplicationArguments());

    verify(accounts).create(new UserForm("chief", "chief", "ten-or-more-chars", Role.ADMIN));
  }

  @Test
  void createsNobodyWhenUsersExist() {
    given(accounts.anyUser()).willReturn(true);

    new FirstAdmin(accounts, "chief", "ten-or-more-chars").run(new DefaultApplicationArguments());

    verify(accounts, never()).create(any());
  }

  @Test
  void createsNobodyFromAShortPassword() {
    new FirstAdmin(accounts, "chief", "short").run(new DefaultApplicationArguments());

    verify(accounts, never()).create(any());
  }

  @Test
  void replicaThatLosesTheRaceStillStarts() {
    given(accounts.create(any()))
        .willThrow(new DataIntegrityViolationException("app_user_username_key"));

    assertThatCode(
            () ->
                new FirstAdmin(accounts, "chief", "ten-or-more-chars")
                    .run(new DefaultApplicationArguments()))
        .as("start-up after the other replica created the same administrator")
        .doesNotThrowAnyException();
  }

  @Test
  void replicaThatSeesTheNameTakenStillStarts() {
    given(accounts.create(any())).willThrow(new RuleViolation("username", "user.username.taken"));

    assertThatCode(
            () ->
                new FirstAdmin(accounts, "chief", "ten-or-more-chars")
                    .run(new DefaultApplicationArguments()))
        .doesNotThrowAnyException();
  }
}
