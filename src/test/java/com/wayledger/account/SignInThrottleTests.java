package com.wayledger.account;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import org.junit.jupiter.api.Test;

/** The lock-out rules of {@link SignInThrottle}, on a clock the test moves. */
class SignInThrottleTests {

  /** A clock that only moves when told to. */
  static final class StepClock extends Clock {
    Instant now = Instant.parse("2026-01-05T09:00:00Z");

    @Override
    public java.time.ZoneId getZone() {
      return ZoneOffset.UTC;
    }

    @Override
    public Clock withZone(java.time.ZoneId zone) {
      return this;
    }

    @Override
    public Instant instant() {
      return now;
    }
  }

  private final StepClock clock = new StepClock();
  private final SignInThrottle throttle = new SignInThrottle(clock);

  @Test
  void fifthFailureOfOneNameLocksItFromEveryAddressForFifteenMinutes() {
    for (int i = 1; i < SignInThrottle.ACCOUNT_LIMIT; i++) {
      assertThat(throttle.failed("Vera", "10.0.0." + i)).isFalse();
      assertThat(throttle.isLocked("vera", "10.0.0.99")).isFalse();
    }
    assertThat(throttle.failed("vera", "10.0.0.5")).as("the fifth failure locks").isTrue();
    assertThat(throttle.isLocked("VERA", "192.168.1.1")).as("any address, any case").isTrue();
    assertThat(throttle.isLocked("other", "192.168.1.1")).isFalse();
    clock.now = clock.now.plus(SignInThrottle.LOCK).minusSeconds(1);
    assertThat(throttle.isLocked("vera", "192.168.1.1")).isTrue();
    clock.now = clock.now.plusSeconds(1);
    assertThat(throttle.isLocked("vera", "192.168.1.1")).as("lock over").isFalse();
  }

  @Test
  void failuresSpreadBeyondTheWindowDoNotLock() {
    for (int i = 0; i < 3 * SignInThrottle.ACCOUNT_LIMIT; i++) {
      throttle.failed("slow", "10.0.0.1");
      clock.now =
          clock
              .now
              .plus(SignInThrottle.WINDOW.dividedBy(SignInThrottle.ACCOUNT_LIMIT - 1))
              .plusSeconds(1);
      assertThat(throttle.isLocked("slow", "10.0.0.2")).isFalse();
    }
  }

  @Test
  void oneAddressTryingManyNamesIsLockedForAllNames() {
    for (int i = 1; i < SignInThrottle.ADDRESS_LIMIT; i++) {
      throttle.failed("name" + i, "203.0.113.7");
    }
    assertThat(throttle.isLocked("fresh-name", "203.0.113.7")).isFalse();
    assertThat(throttle.failed("name-last", "203.0.113.7")).isTrue();
    assertThat(throttle.isLocked("fresh-name", "203.0.113.7")).isTrue();
    assertThat(throttle.isLocked("fresh-name", "203.0.113.8")).as("other address").isFalse();
  }

  @Test
  void successClearsTheAccountCount() {
    for (int i = 1; i < SignInThrottle.ACCOUNT_LIMIT; i++) {
      throttle.failed("ada", "10.0.0.1");
    }
    throttle.succeeded("ada");
    assertThat(throttle.failed("ada", "10.0.0.1")).isFalse();
  }

  @Test
  void theTablesStayBounded() {
    for (int i = 0; i < SignInThrottle.MAX_TRACKED + 50; i++) {
      throttle.failed("n" + i, "a" + (i % 7));
    }
    clock.now = clock.now.plus(Duration.ofHours(1));
    throttle.failed("late", "b");
    assertThat(throttle.isLocked("n1", "c")).isFalse();
  }
}
