package com.wayledger.account;

import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Counts failed sign-ins per account name and per client address, form and HTTP Basic alike, and
 * locks either for a while once it has failed too often: {@value #ACCOUNT_LIMIT} failures of one
 * account name (from any address) or {@value #ADDRESS_LIMIT} failures from one address (for any
 * names) within {@link #WINDOW} lock that name or address for {@link #LOCK}. Names that do not
 * exist are counted and locked exactly like real ones, so a lock-out says nothing about whether an
 * account exists. A successful sign-in clears the account's count (not the address's). Every
 * lock-out is logged.
 *
 * <p>Counts are kept in memory by each app instance: with two replicas behind one proxy an attacker
 * gets at most twice the attempts. The tables are bounded ({@value #MAX_TRACKED} keys each).
 */
public class SignInThrottle {

  public static final int ACCOUNT_LIMIT = 5;
  public static final int ADDRESS_LIMIT = 20;
  public static final Duration WINDOW = Duration.ofMinutes(15);
  public static final Duration LOCK = Duration.ofMinutes(15);
  static final int MAX_TRACKED = 10_000;

  private static final Logger LOG = LoggerFactory.getLogger(SignInThrottle.class);

  private final Clock clock;
  private final Map<String, Record> accounts = new ConcurrentHashMap<>();
  private final Map<String, Record> addresses = new ConcurrentHashMap<>();

  public SignInThrottle(Clock clock) {
    this.clock = clock;
  }

  /** Failures of one key inside the window, and the end of its lock-out if any. */
  private static final class Record {
    final Deque<Instant> failures = new ArrayDeque<>();
    Instant lockedUntil;
  }

  /** Whether a sign-in as this name from this address must be refused without checking it. */
  public boolean isLocked(String username, String address) {
    Instant now = clock.instant();
    return locked(accounts.get(key(username)), now) || locked(addresses.get(address(address)), now);
  }

  /** Records a failed sign-in; returns true when it locked the account or the address. */
  public boolean failed(String username, String address) {
    Instant now = clock.instant();
    boolean accountLocked =
        count(accounts, key(username), ACCOUNT_LIMIT, now, "account '" + printable(username) + "'");
    boolean addressLocked =
        count(addresses, address(address), ADDRESS_LIMIT, now, "address " + address(address));
    return accountLocked || addressLocked;
  }

  /** A successful sign-in clears the account's failures. */
  public void succeeded(String username) {
    accounts.remove(key(username));
  }

  private boolean count(
      Map<String, Record> table, String key, int limit, Instant now, String described) {
    if (table.size() >= MAX_TRACKED) {
      table.values().removeIf(record -> expired(record, now));
      if (table.size() >= MAX_TRACKED) {
        table.clear();
        LOG.warn("Sign-in throttle table overflowed ({} keys); counts were reset", MAX_TRACKED);
      }
    }
    Record record = table.computeIfAbsent(key, k -> new Record());
    synchronized (record) {
      while (!record.failures.isEmpty()
          && record.failures.peekFirst().isBefore(now.minus(WINDOW))) {
        record.failures.removeFirst();
      }
      record.failures.addLast(now);
      if (record.failures.size() >= limit && !locked(record, now)) {
        record.lockedUntil = now.plus(LOCK);
        record.failures.clear();
        LOG.warn(
            "Sign-in locked for {} until {} after {} failures within {} minutes",
            described,
            record.lockedUntil,
            limit,
            WINDOW.toMinutes());
        return true;
      }
      return false;
    }
  }

  private static boolean locked(Record record, Instant now) {
    return record != null && record.lockedUntil != null && now.isBefore(record.lockedUntil);
  }

  private static boolean expired(Record record, Instant now) {
    synchronized (record) {
      return !locked(record, now)
          && (record.failures.isEmpty() || record.failures.peekLast().isBefore(now.minus(WINDOW)));
    }
  }

  private static String key(String username) {
    return username == null ? "" : username.strip().toLowerCase(Locale.ROOT);
  }

  private static String address(String address) {
    return address == null ? "unknown" : address;
  }

  /** A user name fit for the log: printable ASCII only, at most 60 characters. */
  private static String printable(String username) {
    String name = username == null ? "" : username;
    StringBuilder out = new StringBuilder();
    name.chars().limit(60).forEach(c -> out.append(c >= 0x20 && c < 0x7f ? (char) c : '?'));
    return out.toString();
  }
}
