package com.wayledger.loadlog;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.temporal.ChronoUnit;
import java.util.HexFormat;

/**
 * The hash chain of a site's change log. Each entry's hash is SHA-256 over its fields and the hash
 * of the entry before it in the same site's chain, written as one text: every field as its length
 * in UTF-8 bytes, a colon and the value (a tilde when empty), the fields joined by "|"; a
 * back-dated entry's effective day (ISO date) comes last, only when set. The database trigger on
 * PostgreSQL (migration 8.1, {@link ChangeLogChainMigration#POSTGRESQL}) builds the same text in
 * SQL; {@link ChangeRecorder} builds it here on H2; {@link ChangeLog#verify} rebuilds it from the
 * stored fields to check the chain.
 */
final class LogChain {

  /** The time as both sides write it: UTC, microseconds (PostgreSQL's precision). */
  static final DateTimeFormatter TIME =
      DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mm:ss.SSSSSS'Z'").withZone(ZoneOffset.UTC);

  private LogChain() {}

  /** The fields an entry's hash covers, in their order. */
  record Fields(
      long siteSeq,
      long siteId,
      Long boardId,
      Long circuitId,
      Instant happenedAt,
      String username,
      String dbUser,
      String kind,
      String summary,
      String before,
      String after,
      String reason,
      String previousHash,
      java.time.LocalDate effectiveOn) {

    /** The fields of an entry that took effect when it was recorded. */
    Fields(
        long siteSeq,
        long siteId,
        Long boardId,
        Long circuitId,
        Instant happenedAt,
        String username,
        String dbUser,
        String kind,
        String summary,
        String before,
        String after,
        String reason,
        String previousHash) {
      this(
          siteSeq,
          siteId,
          boardId,
          circuitId,
          happenedAt,
          username,
          dbUser,
          kind,
          summary,
          before,
          after,
          reason,
          previousHash,
          null);
    }

    String canonical() {
      String recorded = recordedFields();
      // the effective day joins the text only when set: entries written before it existed keep
      // their hashes
      return effectiveOn == null ? recorded : recorded + "|" + field(effectiveOn.toString());
    }

    private String recordedFields() {
      return String.join(
          "|",
          field(Long.toString(siteSeq)),
          field(Long.toString(siteId)),
          field(boardId == null ? null : boardId.toString()),
          field(circuitId == null ? null : circuitId.toString()),
          field(TIME.format(happenedAt.truncatedTo(ChronoUnit.MICROS))),
          field(username),
          field(dbUser),
          field(kind),
          field(summary),
          field(before),
          field(after),
          field(reason),
          field(previousHash));
    }

    String hash() {
      try {
        byte[] digest =
            MessageDigest.getInstance("SHA-256")
                .digest(canonical().getBytes(StandardCharsets.UTF_8));
        return HexFormat.of().formatHex(digest);
      } catch (NoSuchAlgorithmException impossible) {
        throw new IllegalStateException(impossible);
      }
    }
  }

  static String field(String value) {
    return value == null ? "~" : value.getBytes(StandardCharsets.UTF_8).length + ":" + value;
  }
}
