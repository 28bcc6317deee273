package com.wayledger.account;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.UUID;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;

/**
 * Personal API tokens: created on the account page and shown once, stored as SHA-256 only, accepted
 * as {@code Authorization: Bearer}, limited by scope and by the owner's role, refused once revoked.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class ApiTokenIntegrationTests {

  private static final Pattern TOKEN = Pattern.compile("wlt_[A-Za-z0-9_-]{43}");

  @Autowired MockMvc mvc;
  @Autowired AccountService accounts;
  @Autowired JdbcClient jdbc;

  @Test
  void aCreatedTokenIsShownOnceAndOnlyItsSha256IsStored() throws Exception {
    String owner = storedUser(Role.EDITOR);
    String token = createToken(owner, "nightly export", TokenScope.READ);

    String stored =
        jdbc.sql(
                "SELECT token_sha256 FROM api_token WHERE name = 'nightly export' AND user_id ="
                    + " (SELECT id FROM app_user WHERE username = ?)")
            .param(owner)
            .query(String.class)
            .single();
    assertThat(stored).isEqualTo(ApiTokens.sha256(token)).doesNotContain(token);
    String accountPage =
        mvc.perform(get("/account").with(user(owner).roles("EDITOR")))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(accountPage).contains("nightly export").doesNotContain(token);
  }

  @Test
  void aTokenWithoutANameIsRefusedBesideTheField() throws Exception {
    String owner = storedUser(Role.VIEWER);
    String page =
        mvc.perform(
                post("/account/tokens")
                    .with(user(owner).roles("VIEWER"))
                    .with(csrf())
                    .param("name", " ")
                    .param("scope", "READ"))
            .andExpect(status().is(422))
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(page).contains("class=\"error\"");
    assertThat(TOKEN.matcher(page).find()).as("no token issued").isFalse();
  }

  static Stream<Arguments> scopeRoleAndRequest() {
    return Stream.of(
        // owner's role, token scope, write?, expected status
        Arguments.of(Role.VIEWER, TokenScope.READ, false, 200),
        Arguments.of(Role.VIEWER, TokenScope.READ, true, 403),
        Arguments.of(Role.VIEWER, TokenScope.READ_WRITE, false, 200),
        Arguments.of(Role.VIEWER, TokenScope.READ_WRITE, true, 403),
        Arguments.of(Role.EDITOR, TokenScope.READ, false, 200),
        Arguments.of(Role.EDITOR, TokenScope.READ, true, 403),
        Arguments.of(Role.EDITOR, TokenScope.READ_WRITE, false, 200),
        Arguments.of(Role.EDITOR, TokenScope.READ_WRITE, true, 201),
        Arguments.of(Role.ADMIN, TokenScope.READ, true, 403),
        Arguments.of(Role.ADMIN, TokenScope.READ_WRITE, true, 201));
  }

  @ParameterizedTest(name = "{0} with a {1} token, write={2}: {3}")
  @MethodSource("scopeRoleAndRequest")
  void aTokenMayDoWhatBothItsScopeAndItsOwnersRoleAllow(
      Role role, TokenScope scope, boolean write, int expected) throws Exception {
    String owner = storedUser(role);
    String token = createToken(owner, "matrix", scope);

    if (write) {
      mvc.perform(
              post("/api/sites")
                  .header("Authorization", "Bearer " + token)
                  .contentType(MediaType.APPLICATION_JSON)
                  .content(
                      "{\"name\":\"Token site "
                          + UUID.randomUUID()
                          + "\",\"earthingSystem\":\"TN_S\",\"nominalVoltageVolts\":230,"
                          + "\"phases\":3,\"frequencyHertz\":50}"))
          .andExpect(status().is(expected));
    } else {
      mvc.perform(get("/api/sites").header("Authorization", "Bearer " + token))
          .andExpect(status().is(expected));
    }
  }

  @Test
  void aChangeMadeWithATokenIsLoggedUnderItsOwner() throws Exception {
    String owner = storedUser(Role.EDITOR);
    String token = createToken(owner, "logger", TokenScope.READ_WRITE);
    String name = "Token log site " + UUID.randomUUID();

    mvc.perform(
            post("/api/sites")
                .header("Authorization", "Bearer " + token)
                .contentType(MediaType.APPLICATION_JSON)
                .content(
                    "{\"name\":\""
                        + name
                        + "\",\"earthingSystem\":\"TN_S\",\"nominalVoltageVolts\":230,"
                        + "\"phases\":1,\"frequencyHertz\":50}"))
        .andExpect(status().isCreated());

    assertThat(
            jdbc.sql("SELECT username FROM change_log WHERE kind = 'SITE_ADDED' AND summary LIKE ?")
                .param("%" + name + "%")
                .query(String.class)
                .single())
        .isEqualTo(owner);
  }

  @Test
  void aRevokedTokenIsRefusedAndNothingFallsBackToAnotherSignIn() throws Exception {
    String owner = storedUser(Role.EDITOR);
    String token = createToken(owner, "to revoke", TokenScope.READ);
    long id =
        jdbc.sql("SELECT id FROM api_token WHERE token_sha256 = ?")
            .param(ApiTokens.sha256(token))
            .query(Long.class)
            .single();
    mvc.perform(get("/api/sites").header("Authorization", "Bearer " + token))
        .andExpect(status().isOk());

    mvc.perform(
            post("/account/tokens/{id}/revoke", id).with(user(owner).roles("EDITOR")).with(csrf()))
        .andExpect(status().is3xxRedirection());

    mvc.perform(get("/api/sites").header("Authorization", "Bearer " + token))
        .andExpect(status().isUnauthorized())
        .andExpect(header().string("WWW-Authenticate", "Bearer error=\"invalid_token\""));
  }

  @Test
  void anUnknownTokenIsRefused() throws Exception {
    mvc.perform(get("/api/sites").header("Authorization", "Bearer wlt_" + "A".repeat(43)))
        .andExpect(status().isUnauthorized());
  }

  @Test
  void someoneElsesTokenCannotBeRevoked() throws Exception {
    String owner = storedUser(Role.EDITOR);
    String token = createToken(owner, "mine", TokenScope.READ);
    long id =
        jdbc.sql("SELECT id FROM api_token WHERE token_sha256 = ?")
            .param(ApiTokens.sha256(token))
            .query(Long.class)
            .single();
    String other = storedUser(Role.ADMIN);

    mvc.perform(
            post("/account/tokens/{id}/revoke", id).with(user(other).roles("ADMIN")).with(csrf()))
        .andExpect(status().isNotFound());
    mvc.perform(get("/api/sites").header("Authorization", "Bearer " + token))
        .andExpect(status().isOk());
  }

  @Test
  void theDayOfLastUseIsRecorded() throws Exception {
    String owner = storedUser(Role.VIEWER);
    String token = createToken(owner, "dated", TokenScope.READ);
    assertThat(lastUsed(token)).as("never used yet").isNull();

    mvc.perform(get("/api/sites").header("Authorization", "Bearer " + token))
        .andExpect(status().isOk());

    assertThat(lastUsed(token))
        .isEqualTo(java.time.LocalDate.now(java.time.ZoneOffset.UTC).toString());
  }

  @Test
  void theApiDescriptionOffersTheTokenAndBasicSchemes() throws Exception {
    mvc.perform(get("/api/openapi"))
        .andExpect(status().isOk())
        .andExpect(jsonPath("$.components.securitySchemes.token.scheme").value("bearer"))
        .andExpect(jsonPath("$.components.securitySchemes.basic.scheme").value("basic"));
  }

  private String lastUsed(String token) {
    return jdbc.sql(
            "SELECT CAST(last_used_on AS VARCHAR(10)) FROM api_token WHERE token_sha256 = ?")
        .param(ApiTokens.sha256(token))
        .query(String.class)
        .optional()
        .orElse(null);
  }

  private String storedUser(Role role) {
    String username = "tok-" + UUID.randomUUID().toString().substring(0, 8);
    accounts.create(new UserForm(username, "Token tester", "long-enough-password", role));
    return username;
  }

  private String createToken(String owner, String name, TokenScope scope) throws Exception {
    String page =
        mvc.perform(
                post("/account/tokens")
                    .with(user(owner).roles("VIEWER"))
                    .with(csrf())
                    .param("name", name)
                    .param("scope", scope.name()))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    Matcher shown = TOKEN.matcher(page);
    assertThat(shown.find()).as("the new token is shown on the page").isTrue();
    return shown.group();
  }
}
