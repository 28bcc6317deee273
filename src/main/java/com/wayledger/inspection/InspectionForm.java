package com.wayledger.inspection;

import java.util.List;

/**
 * The result grid as typed: every measured value is text, parsed by {@link Readings} so that a
 * reading such as "&gt;299" or "0,45" is accepted and a typo gets a message beside its cell.
 *
 * @param inspectedOn date of the inspection, yyyy-mm-dd
 * @param testCelsius temperature at which continuity was measured, °C (blank: 20 °C)
 * @param insulationTestVolts DC test voltage of the insulation tests, V
 * @param mainBonding "yes", "no" or blank (not checked)
 * @param correctsId the earlier record this one corrects, or null
 * @param confirmedOutcome the outcome the inspector confirmed (SATISFACTORY or UNSATISFACTORY)
 */
public record InspectionForm(
    String inspectedOn,
    String inspector,
    String instruments,
    String testCelsius,
    String insulationTestVolts,
    String ze,
    String pfc,
    String electrode,
    String mainBonding,
    String notes,
    Long correctsId,
    String confirmedOutcome,
    List<ResultEntry> rows,
    List<ObservationEntry> observations) {

  public InspectionForm {
    rows = rows == null ? List.of() : rows.stream().filter(r -> r != null).toList();
    observations =
        observations == null ? List.of() : observations.stream().filter(o -> o != null).toList();
  }

  /**
   * One circuit's row of the grid.
   *
   * @param polarity "ok", "wrong" or blank
   * @param rcdButton "ok", "wrong" or blank
   */
  public record ResultEntry(
      Long circuitId,
      String r1r2,
      String r2,
      String ringR1,
      String ringRn,
      String ringR2,
      String irLl,
      String irLe,
      String irNe,
      String polarity,
      String zs,
      String rcd1,
      String rcd5,
      String rcdButton,
      Boolean rcdDelayed) {

    /** The text of a grid column by its name (as in the field names). */
    public String value(String column) {
      return switch (column) {
        case "r1r2" -> r1r2;
        case "r2" -> r2;
        case "ringR1" -> ringR1;
        case "ringRn" -> ringRn;
        case "ringR2" -> ringR2;
        case "irLl" -> irLl;
        case "irLe" -> irLe;
        case "irNe" -> irNe;
        case "polarity" -> polarity;
        case "zs" -> zs;
        case "rcd1" -> rcd1;
        case "rcd5" -> rcd5;
        case "rcdButton" -> rcdButton;
        default -> throw new IllegalArgumentException("no grid column " + column);
      };
    }

    static ResultEntry blank(long circuitId) {
      return new ResultEntry(circuitId, "", "", "", "", "", "", "", "", "", "", "", "", "", false);
    }
  }

  /**
   * One observation line: a proposal (proposedText set) the inspector keeps or drops and may edit,
   * or the inspector's own (proposedText blank; kept when its text is not blank).
   *
   * @param decision "keep" or "drop" for a proposal
   * @param urgency an {@link com.wayledger.engine.inspection.Urgency} name
   */
  public record ObservationEntry(
      String decision,
      String urgency,
      String text,
      Long circuitId,
      String wayLabel,
      String proposedUrgency,
      String proposedText) {

    public boolean isProposal() {
      return proposedText != null && !proposedText.isBlank();
    }

    public boolean isKept() {
      return text != null && !text.isBlank() && (!isProposal() || !"drop".equals(decision));
    }
  }
}
