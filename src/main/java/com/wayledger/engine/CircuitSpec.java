package com.wayledger.engine;

import java.util.List;

/**
 * What one position of a board feeds: device, cable and loads.
 *
 * @param id stable identifier of the stored circuit (0 for an unsaved one)
 * @param wayNumber way number on the board, from 1
 * @param position the line(s) the circuit occupies
 * @param description what the circuit feeds
 * @param status in use, spare device or empty space
 * @param lockedForBalancing whether phase balancing must leave it where it is
 * @param device protective device; null for an empty space
 * @param cable circuit cable; null when not recorded
 * @param loads load items, possibly none
 * @param feedsBoardId id of the sub-board this circuit feeds as a submain; null for a final circuit
 * @param measuredLoopImpedanceOhms Zs measured at the circuit's far end; null when not measured
 * @param ringFinal whether the cable is a ring final circuit (leaves the board and returns to it);
 *     its recorded length is then the whole ring's length
 * @param location where its equipment is, for the residual-current rules; null when not recorded
 */
public record CircuitSpec(
    long id,
    int wayNumber,
    PhasePosition position,
    String description,
    WayStatus status,
    boolean lockedForBalancing,
    DeviceSpec device,
    CableSpec cable,
    List<LoadSpec> loads,
    Long feedsBoardId,
    Double measuredLoopImpedanceOhms,
    boolean ringFinal,
    CircuitLocation location) {

  public CircuitSpec {
    loads = List.copyOf(loads);
  }

  /** A circuit whose location is not recorded: the argument list from before locations. */
  public CircuitSpec(
      long id,
      int wayNumber,
      PhasePosition position,
      String description,
      WayStatus status,
      boolean lockedForBalancing,
      DeviceSpec device,
      CableSpec cable,
      List<LoadSpec> loads,
      Long feedsBoardId,
      Double measuredLoopImpedanceOhms,
      boolean ringFinal) {
    this(
        id,
        wayNumber,
        position,
        description,
        status,
        lockedForBalancing,
        device,
        cable,
        loads,
        feedsBoardId,
        measuredLoopImpedanceOhms,
        ringFinal,
        null);
  }

  /** The same circuit at another location (null: not recorded). */
  public CircuitSpec at(CircuitLocation where) {
    return new CircuitSpec(
        id,
        wayNumber,
        position,
        description,
        status,
        lockedForBalancing,
        device,
        cable,
        loads,
        feedsBoardId,
        measuredLoopImpedanceOhms,
        ringFinal,
        where);
  }

  /**
   * A radial circuit (not a ring final circuit): the argument list from before rings were recorded.
   */
  public CircuitSpec(
      long id,
      int wayNumber,
      PhasePosition position,
      String description,
      WayStatus status,
      boolean lockedForBalancing,
      DeviceSpec device,
      CableSpec cable,
      List<LoadSpec> loads,
      Long feedsBoardId,
      Double measuredLoopImpedanceOhms) {
    this(
        id,
        wayNumber,
        position,
        description,
        status,
        lockedForBalancing,
        device,
        cable,
        loads,
        feedsBoardId,
        measuredLoopImpedanceOhms,
        false);
  }
}
