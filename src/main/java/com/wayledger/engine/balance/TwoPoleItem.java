package com.wayledger.engine.balance;

/**
 * A two-pole, line-to-line breaker on a three-line panelboard as the balancer sees it: it takes two
 * vertically adjacent spaces ({@code firstSpace} and {@code firstSpace + 2}), so it sits on the
 * pair of lines of those two rows (A–B, B–C or C–A), and may move to a free pair of adjacent spaces
 * whose lines form another pair.
 *
 * @param circuitId stable identifier of the circuit, unique within a problem (with the single-pole
 *     items)
 * @param description what the circuit feeds, used in the move list
 * @param lineAmps the current it puts on each of its two lines, amperes (|S| / U_LL); {@code null}
 *     when not known, which makes the whole balance "not assessed"
 * @param firstSpace the space of its top pole
 * @param movable {@code false} keeps it where it is (a locked circuit)
 */
public record TwoPoleItem(
    long circuitId, String description, Double lineAmps, int firstSpace, boolean movable) {

  /** The description, or "#id" when the circuit has none, for messages. */
  public String label() {
    return description == null || description.isBlank() ? "#" + circuitId : description;
  }
}
