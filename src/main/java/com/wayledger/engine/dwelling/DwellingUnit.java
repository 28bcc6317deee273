package com.wayledger.engine.dwelling;

import java.util.List;

/**
 * A dwelling unit as the methods see it: the board that serves it, its inputs and its loads.
 *
 * @param boardId the stored board that serves the unit
 * @param reference the board's name on site
 * @param inputs floor area, circuits and the methods to work
 * @param loads every load line on the board (lighting and receptacle loads are replaced by the unit
 *     loads of 220.12 and 220.52)
 */
public record DwellingUnit(
    long boardId, String reference, DwellingInputs inputs, List<ApplianceLoad> loads) {

  public DwellingUnit {
    loads = List.copyOf(loads);
  }
}
