package com.wayledger.diagram;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;

/**
 * What the single-line diagram of one site shows, read from the stored schedule and the site's
 * analysis; no layout and no drawing.
 *
 * @param siteId the site
 * @param siteName its name
 * @param supply the origin's figures
 * @param boards every board in tree order (each parent before its children)
 * @param expandedBoardId the board whose ways are drawn one by one; null when none
 */
public record SiteDiagram(
    long siteId, String siteName, Supply supply, List<BoardBox> boards, Long expandedBoardId) {

  public SiteDiagram {
    boards = List.copyOf(boards);
  }

  /** Boards fed from another board: each has exactly one submain edge. */
  public long submainCount() {
    return boards.stream().filter(board -> board.parentId() != null).count();
  }

  /**
   * The supply at the origin.
   *
   * @param earthing earthing system as text (TN-S, TN-C-S, TT)
   * @param nominalVoltageVolts U0, V
   * @param phases 1 or 3
   * @param externalLoopImpedanceOhms Ze, Ω; null when not recorded
   * @param faultCurrentKiloAmps prospective fault current, kA; null when not recorded
   * @param fuseRatingAmps supply fuse rating, A; null when not recorded
   */
  public record Supply(
      String earthing,
      double nominalVoltageVolts,
      int phases,
      Double externalLoopImpedanceOhms,
      Double faultCurrentKiloAmps,
      Double fuseRatingAmps) {}

  /**
   * A protective or switching device as drawn: its kind picks the symbol.
   *
   * @param kind the device kind; null when no device is recorded
   * @param label short text such as "MCB C32" or "MCCB 125 A (Ir 100 A, Ii 800 A)"; empty when none
   */
  public record Device(DeviceKind kind, String label) {
    static final Device NONE = new Device(null, "");

    public boolean isRecorded() {
      return kind != null;
    }
  }

  /**
   * One line's demand current against the board's incomer rating.
   *
   * @param line L1, L2 or L3
   * @param currentAmps demand current, A
   * @param loadingPercent current ÷ incomer In, %; null when the rating is not recorded
   */
  public record LineBar(String line, double currentAmps, Double loadingPercent) {}

  /**
   * One way of an expanded board.
   *
   * @param circuitId the circuit
   * @param position "3 L2" or "4 L1–L3"
   * @param description what it feeds
   * @param device its device
   * @param designCurrentAmps Ib, A; null when not assessed
   * @param worst its worst problem; null when none
   */
  public record WayLine(
      long circuitId,
      String position,
      String description,
      Device device,
      Double designCurrentAmps,
      Verdict worst) {}

  /**
   * One board and the submain that feeds it.
   *
   * @param id the board
   * @param reference its name on site
   * @param location where it is; may be empty
   * @param parentId the board feeding it; null when fed from the origin
   * @param depth levels below the origin (0 = fed from the origin)
   * @param incomer its incomer device
   * @param busbarRatingAmps busbar rating, A; null when not recorded
   * @param demandKilowatts demand after diversity, kW
   * @param lines per-line loading bars
   * @param worst the grade of its worst finding (its own and its circuits'); null when none
   * @param problemCount how many findings ask for action or were not assessed
   * @param circuitCount outgoing circuits recorded (spares included, empty spaces not)
   * @param feedDevice the parent's way device that protects the submain; NONE from the origin
   * @param feedCircuitId the parent's circuit feeding it; null when not recorded
   * @param submainCable cable size and length as text; empty when not recorded
   * @param voltageDropPercent voltage drop from the origin to this board, %; null when not known
   * @param voltageDropMissing why it is not known; null when known
   * @param ways its ways one by one when this board is expanded; empty otherwise
   */
  public record BoardBox(
      long id,
      String reference,
      String location,
      Long parentId,
      int depth,
      Device incomer,
      Double busbarRatingAmps,
      double demandKilowatts,
      List<LineBar> lines,
      Verdict worst,
      long problemCount,
      int circuitCount,
      Device feedDevice,
      Long feedCircuitId,
      String submainCable,
      Double voltageDropPercent,
      String voltageDropMissing,
      List<WayLine> ways) {

    public BoardBox {
      lines = List.copyOf(lines);
      ways = List.copyOf(ways);
    }
  }
}
