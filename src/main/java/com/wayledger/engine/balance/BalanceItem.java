package com.wayledger.engine.balance;

import com.wayledger.engine.Phase;

/**
 * One single-phase circuit as the balancer sees it.
 *
 * @param circuitId stable identifier of the circuit, unique within a problem
 * @param description what the circuit feeds, used in the move list ("Bakery mixer")
 * @param demandAmps the circuit's diversified demand current, amperes; {@code null} when not known,
 *     which makes the whole balance "not assessed"
 * @param currentPhase the line the circuit sits on now; {@code null} for a circuit not yet placed
 *     (a new board being drafted), which the optimal mode accepts and the fewest-moves mode does
 *     not
 * @param currentWay the way number it occupies now; {@code null} when not placed or not recorded
 * @param movable {@code false} keeps the circuit on its current phase (a locked circuit); its
 *     demand then counts as fixed load on that phase
 */
public record BalanceItem(
    long circuitId,
    String description,
    Double demandAmps,
    Phase currentPhase,
    Integer currentWay,
    boolean movable) {

  /** The description, or "#id" when the circuit has none, for messages. */
  public String label() {
    return description == null || description.isBlank() ? "#" + circuitId : description;
  }
}
