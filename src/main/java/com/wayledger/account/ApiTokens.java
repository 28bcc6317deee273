package com.wayledger.account;

import com.wayledger.system.NotFoundException;
import com.wayledger.system.RuleViolation;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.security.SecureRandom;
import java.sql.Date;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.Base64;
import java.util.HexFormat;
import java.util.List;
import java.util.Optional;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.security.authentication.UsernamePasswordAuthenticationToken;
import org.springframework.security.core.Authentication;
import org.springframework.security.core.authority.AuthorityUtils;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Personal API tokens: created and revoked by their owner, shown once, stored as their SHA-256
 * only. A token signs an API request in as its owner with {@code Authorization: Bearer <token>}; a
 * read-scoped token acts as a viewer whatever its owner's role.
 */
@Service
public class ApiTokens {

  /** Tokens start with this, so that a leaked one is easy to recognise in logs and code. */
  static final String PREFIX = "wlt_";

  static final int MAX_PER_USER = 20;

  private static final SecureRandom RANDOM = new SecureRandom();

  private final JdbcClient jdbc;

  public ApiTokens(JdbcClient jdbc) {
    this.jdbc = jdbc;
  }

  /** A token as listed to its owner: never the secret itself. */
  public record Listed(
      long id, String name, TokenScope scope, Instant createdAt, LocalDate lastUsedOn) {

    /** The day it was created, UTC (ISO date). */
    public LocalDate createdOn() {
      return LocalDate.ofInstant(createdAt, ZoneOffset.UTC);
    }
  }

  /** A token just created: the secret is in {@code token}, and it is not stored anywhere. */
  public record Created(long id, String name, TokenScope scope, String token) {}

  @Transactional(readOnly = true)
  public List<Listed> of(String username) {
    return jdbc.sql(
            "SELECT t.id, t.name, t.scope, t.created_at, t.last_used_on FROM api_token t"
                + " JOIN app_user u ON u.id = t.user_id WHERE u.username = ? ORDER BY t.created_at, t.id")
        .param(username)
        .query(
            (row, n) ->
                new Listed(
                    row.getLong("id"),
                    row.getString("name"),
                    TokenScope.valueOf(row.getString("scope")),
                    row.getTimestamp("created_at").toInstant(),
                    row.getDate("last_used_on") == null
                        ? null
                        : row.getDate("last_used_on").toLocalDate()))
        .list();
  }

  @Transactional
  public Created create(String username, TokenForm form) {
    long userId = userId(username);
    int held =
        jdbc.sql("SELECT COUNT(*) FROM api_token WHERE user_id = ?")
            .param(userId)
            .query(Integer.class)
            .single();
    if (held >= MAX_PER_USER) {
      throw new RuleViolation("name", "token.tooMany", MAX_PER_USER);
    }
    byte[] secret = new byte[32];
    RANDOM.nextBytes(secret);
    String token = PREFIX + Base64.getUrlEncoder().withoutPadding().encodeToString(secret);
    String name = form.name().strip();
    jdbc.sql(
            "INSERT INTO api_token (user_id, name, token_sha256, scope, created_at)"
                + " VALUES (?, ?, ?, ?, ?)")
        .params(
            userId,
            name,
            sha256(token),
            form.scope().name(),
            java.sql.Timestamp.from(Instant.now()))
        .update();
    long id =
        jdbc.sql("SELECT id FROM api_token WHERE token_sha256 = ?")
            .param(sha256(token))
            .query(Long.class)
            .single();
    return new Created(id, name, form.scope(), token);
  }

  /** Revokes one of the user's own tokens; a token of someone else is not found. */
  @Transactional
  public void revoke(String username, long tokenId) {
    int removed =
        jdbc.sql(
                "DELETE FROM api_token WHERE id = ? AND user_id = (SELECT id FROM app_user WHERE username = ?)")
            .params(tokenId, username)
            .update();
    if (removed == 0) {
      throw new NotFoundException("API token", tokenId);
    }
  }

  /**
   * The signed-in owner of a presented token, or empty when it is unknown, revoked or its owner is
   * disabled. Notes the day of use (one write per token per day at most). No transaction: one
   * SELECT, and on a token's first use of the day one UPDATE, each on its own.
   */
  public Optional<Authentication> authenticate(String presented) {
    if (presented == null || !presented.startsWith(PREFIX) || presented.length() > 100) {
      return Optional.empty();
    }
    Optional<Holder> holder =
        jdbc.sql(
                "SELECT t.id, t.scope, t.last_used_on, u.username, u.role, u.enabled FROM api_token t"
                    + " JOIN app_user u ON u.id = t.user_id WHERE t.token_sha256 = ?")
            .param(sha256(presented))
            .query(
                (row, n) ->
                    new Holder(
                        row.getLong("id"),
                        TokenScope.valueOf(row.getString("scope")),
                        row.getDate("last_used_on"),
                        row.getString("username"),
                        Role.valueOf(row.getString("role")),
                        row.getBoolean("enabled")))
            .optional();
    if (holder.isEmpty() || !holder.get().enabled()) {
      return Optional.empty();
    }
    Holder who = holder.get();
    LocalDate today = LocalDate.now(ZoneOffset.UTC);
    if (who.lastUsedOn() == null || !who.lastUsedOn().toLocalDate().equals(today)) {
      jdbc.sql("UPDATE api_token SET last_used_on = ? WHERE id = ?")
          .params(Date.valueOf(today), who.tokenId())
          .update();
    }
    Role acting = who.scope() == TokenScope.READ ? Role.VIEWER : who.role();
    return Optional.of(
        UsernamePasswordAuthenticationToken.authenticated(
            who.username(), null, AuthorityUtils.createAuthorityList("ROLE_" + acting.name())));
  }

  private record Holder(
      long tokenId,
      TokenScope scope,
      Date lastUsedOn,
      String username,
      Role role,
      boolean enabled) {}

  private long userId(String username) {
    return jdbc.sql("SELECT id FROM app_user WHERE username = ?")
        .param(username)
        .query(Long.class)
        .optional()
        .orElseThrow(() -> new RuleViolation("name", "token.noAccount"));
  }

  static String sha256(String token) {
    try {
      return HexFormat.of()
          .formatHex(
              MessageDigest.getInstance("SHA-256").digest(token.getBytes(StandardCharsets.UTF_8)));
    } catch (NoSuchAlgorithmException absent) {
      throw new IllegalStateException("SHA-256 is part of every Java runtime", absent);
    }
  }
}
