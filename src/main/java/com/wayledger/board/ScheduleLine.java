package com.wayledger.board;

import java.util.List;

/**
 * One row of the schedule table as it is printed: every cell's text, link and CSS class worked out
 * in Java ({@link ScheduleLines}), so that the template reads one property per cell instead of
 * evaluating expressions, message look-ups and links row after row. Exactly one of {@link
 * #continuation}, {@link #circuit} and {@link #free} is true.
 *
 * @param elementId the row's stable element id ("pos-4-L2")
 * @param way the way number as printed
 * @param phaseClass CSS classes of the line marker ("phase ph-L2")
 * @param phase the line as printed in the position cell (empty on a single-line board, except on a
 *     continuation row)
 * @param continuation whether the row continues a multi-pole circuit shown on a row above
 * @param circuit whether a circuit starts on this row (the cells below are then filled)
 * @param free whether nothing is recorded at this position
 * @param rowClass CSS class of a circuit row ("status-IN_USE")
 * @param span rows the circuit's cells span
 * @param href the circuit's page (checks, proposal, chart)
 * @param description the circuit's description
 * @param locked whether it is locked against balancing moves
 * @param ring whether it is a ring final circuit
 * @param needed what its checks still lack; null when nothing is
 * @param device the device's label, or the "none" word
 * @param cable the cable's label in the board's units, or the "none" word
 * @param loads its loads
 * @param figures connected kW, Ib and demand current; null unless assessed
 * @param notAssessed "not assessed: why" when the demand could not be worked out; else null
 * @param noDemand whether there are no demand figures for the circuit at all (empty cells)
 * @param badges problem counts per verdict, linked to the findings below the table
 * @param status the way status in words
 * @param editHref where the editor row is fetched from (htmx)
 * @param editLabel the edit button's accessible name ("Edit Kitchen")
 * @param deleteHref where the delete button posts (htmx)
 * @param deleteLabel the delete button's accessible name
 * @param addHref on a free row, where the new-circuit editor is fetched from
 * @param addLabel on a free row, the add button's accessible name ("Add a circuit here 4 L1")
 * @param autofocus whether the add button takes the keyboard focus (the next free row after a save)
 */
public record ScheduleLine(
    String elementId,
    String way,
    String phaseClass,
    String phase,
    boolean continuation,
    boolean circuit,
    boolean free,
    String rowClass,
    int span,
    String href,
    String description,
    boolean locked,
    boolean ring,
    Needed needed,
    String device,
    String cable,
    List<Load> loads,
    ScheduleFigures figures,
    String notAssessed,
    boolean noDemand,
    List<Badge> badges,
    String status,
    String editHref,
    String editLabel,
    String deleteHref,
    String deleteLabel,
    String addHref,
    String addLabel,
    boolean autofocus) {

  /**
   * The rowspan printed on the circuit's cells: null, so that no attribute is printed, when the
   * circuit takes one row (a browser reads a missing rowspan as 1).
   */
  public Integer rowspan() {
    return span > 1 ? span : null;
  }

  /** This line with its add button taking the keyboard focus (the next free row after a save). */
  public ScheduleLine withAutofocus() {
    return new ScheduleLine(
        elementId,
        way,
        phaseClass,
        phase,
        continuation,
        circuit,
        free,
        rowClass,
        span,
        href,
        description,
        locked,
        ring,
        needed,
        device,
        cable,
        loads,
        figures,
        notAssessed,
        noDemand,
        badges,
        status,
        editHref,
        editLabel,
        deleteHref,
        deleteLabel,
        addHref,
        addLabel,
        true);
  }

  /**
   * The inputs a circuit's checks still lack.
   *
   * @param elementId "needed-c7"
   * @param lead "Still needed for full checks (2 inputs):"
   * @param items each input in words, all but the last followed by a comma
   */
  public record Needed(String elementId, String lead, List<String> items) {}

  /** One load: its description and its rating ("2 × 3 kW"). */
  public record Load(String description, String rating) {}

  /**
   * A count of problems of one verdict.
   *
   * @param href the circuit's findings below the table ("#findings-c7")
   * @param cssClass "badge v-DANGER"
   * @param text "1 ▲ danger"
   */
  public record Badge(String href, String cssClass, String text) {}

  /**
   * The words every row of a schedule shares, looked up once per page.
   *
   * @param locked the "locked" tag
   * @param ring the "ring" tag
   * @param device the device column's name (the cell's data-label on narrow screens)
   * @param cable the cable column's name
   * @param connected the kW column's name
   * @param designCurrent the Ib column's name
   * @param demand the demand column's name
   * @param edit the edit button
   * @param delete the delete button
   * @param confirmDelete the question before a delete
   * @param add the add button
   * @param free "free position"
   */
  public record Words(
      String locked,
      String ring,
      String device,
      String cable,
      String connected,
      String designCurrent,
      String demand,
      String edit,
      String delete,
      String confirmDelete,
      String add,
      String free) {

    static Words of(PageWords words) {
      return new Words(
          words.word("schedule.locked"),
          words.word("schedule.ring"),
          words.word("schedule.device"),
          words.word("schedule.cable"),
          words.word("schedule.connected"),
          words.word("schedule.ib"),
          words.word("schedule.demand"),
          words.word("action.edit"),
          words.word("action.delete"),
          words.word("confirm.delete"),
          words.word("action.add"),
          words.word("schedule.free"));
    }
  }
}
