package com.wayledger.exchange;

import com.wayledger.board.AnalysisService;
import com.wayledger.board.SiteAnalysis;
import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.PanelSpaces;
import com.wayledger.engine.Phase;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.CircuitDemand;
import com.wayledger.engine.demand.PhaseDemand;
import java.util.HashMap;
import java.util.Map;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.CellRangeAddress;
import org.springframework.core.annotation.Order;
import org.springframework.stereotype.Component;

/**
 * The workbook's "Panel layout" sheet: each exported panelboard (an NEC-set board of two or three
 * lines) as the trade draws it — odd spaces in the left columns, even in the right, each row's line
 * between them, a multi-pole breaker's cells merged down the rows of its spaces, free spaces
 * written as free — followed by its line and neutral currents, all from the site's one analysis.
 */
@Component
@Order(4)
public class PanelSheet implements WorkbookSheet {

  static final String NAME = "Panel layout";

  /**
   * Columns: left space, its breaker, poles, Ib; the row's line; right breaker, poles, Ib, space.
   */
  static final String[] HEADER = {
    "Space", "Breaker", "Poles", "Ib A", "Line", "Breaker", "Poles", "Ib A", "Space"
  };

  static final String FREE = "free space";

  private final AnalysisService analysis;

  public PanelSheet(AnalysisService analysis) {
    this.analysis = analysis;
  }

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public boolean appliesTo(ExportData data) {
    SiteAnalysis results = analysis.ofSite(data.siteId());
    return data.boards().stream().anyMatch(b -> panelOf(results, b.id()) != null);
  }

  private static PanelSpaces panelOf(SiteAnalysis results, long boardId) {
    BoardSpec spec = specOf(results, boardId);
    return spec == null ? null : results.spec().panelSpacesOf(spec);
  }

  private static BoardSpec specOf(SiteAnalysis results, long boardId) {
    return results.spec().boards().stream().filter(b -> b.id() == boardId).findFirst().orElse(null);
  }

  @Override
  public void write(Sheet sheet, ExportData data, String caution) {
    SiteAnalysis results = analysis.ofSite(data.siteId());
    CellStyle bold = sheet.getWorkbook().createCellStyle();
    Font font = sheet.getWorkbook().createFont();
    font.setBold(true);
    bold.setFont(font);
    CellStyle amps = sheet.getWorkbook().createCellStyle();
    amps.setDataFormat(sheet.getWorkbook().createDataFormat().getFormat("0.0"));
    int r = 0;
    text(sheet.createRow(r++), 0, "Panelboard layout — odd spaces left, even right", bold);
    text(sheet.createRow(r++), 0, data.siteName(), null);
    text(sheet.createRow(r++), 0, "Caution: " + caution, bold);
    for (BoardEntry board : data.boards()) {
      PanelSpaces panel = panelOf(results, board.id());
      if (panel == null) {
        continue;
      }
      BoardSpec spec = specOf(results, board.id());
      SupplySystem system = results.spec().systemOf(spec);
      r++;
      text(
          sheet.createRow(r++), 0, spec.reference() + " — " + panel.spaceCount() + " spaces", bold);
      Row header = sheet.createRow(r++);
      for (int c = 0; c < HEADER.length; c++) {
        text(header, c, HEADER[c], bold);
      }
      r = writeRows(sheet, r, panel, spec, results.circuitDemands(board.id()), system, amps);
      r = writeCurrents(sheet, r + 1, results.boardDemand(board.id()), system, bold, amps);
    }
  }

  private static int writeRows(
      Sheet sheet,
      int r,
      PanelSpaces panel,
      BoardSpec spec,
      Map<Long, CircuitDemand> demands,
      SupplySystem system,
      CellStyle amps) {
    Map<Integer, CircuitSpec> top = new HashMap<>();
    Map<Integer, CircuitSpec> covered = new HashMap<>();
    for (CircuitSpec circuit : spec.circuits()) {
      int poles = circuit.position().poles();
      if (panel.fitOf(circuit.wayNumber(), poles) != PanelSpaces.Fit.FITS) {
        poles = 1;
        if (panel.fitOf(circuit.wayNumber(), 1) != PanelSpaces.Fit.FITS) {
          continue;
        }
      }
      top.put(circuit.wayNumber(), circuit);
      for (int space : panel.spacesOf(circuit.wayNumber(), poles)) {
        covered.put(space, circuit);
      }
    }
    int firstRow = r;
    for (int row = 1; row <= panel.rowCount(); row++) {
      int odd = 2 * row - 1;
      Row sheetRow = sheet.createRow(r++);
      sheetRow.createCell(0).setCellValue(odd);
      text(sheetRow, 4, system.lineName(panel.lineOf(odd)), null);
      sheetRow.createCell(8).setCellValue(odd + 1);
      side(sheetRow, 1, odd, top, covered, demands, amps);
      side(sheetRow, 5, odd + 1, top, covered, demands, amps);
    }
    // a multi-pole breaker's cells run down the rows of its spaces
    for (CircuitSpec circuit : top.values()) {
      int poles = circuit.position().poles();
      if (poles < 2 || panel.fitOf(circuit.wayNumber(), poles) != PanelSpaces.Fit.FITS) {
        continue;
      }
      int rowIndex = firstRow + panel.rowOf(circuit.wayNumber()) - 1;
      int column = panel.isLeft(circuit.wayNumber()) ? 1 : 5;
      for (int c = column; c < column + 3; c++) {
        sheet.addMergedRegion(new CellRangeAddress(rowIndex, rowIndex + poles - 1, c, c));
      }
    }
    return r;
  }

  private static void side(
      Row row,
      int column,
      int space,
      Map<Integer, CircuitSpec> top,
      Map<Integer, CircuitSpec> covered,
      Map<Long, CircuitDemand> demands,
      CellStyle amps) {
    CircuitSpec circuit = top.get(space);
    if (circuit == null) {
      if (!covered.containsKey(space)) {
        text(row, column, FREE, null);
      }
      return;
    }
    text(row, column, circuit.description(), null);
    row.createCell(column + 1).setCellValue(circuit.position().poles());
    CircuitDemand demand = demands.get(circuit.id());
    if (demand != null && demand.isAssessed()) {
      Cell ib = row.createCell(column + 2);
      ib.setCellValue(demand.designCurrentAmps());
      ib.setCellStyle(amps);
    } else {
      text(row, column + 2, "not assessed", null);
    }
  }

  private static int writeCurrents(
      Sheet sheet, int r, BoardDemand demand, SupplySystem system, CellStyle bold, CellStyle amps) {
    if (demand == null) {
      text(sheet.createRow(r++), 0, "Line currents: not assessed", bold);
      return r;
    }
    text(sheet.createRow(r++), 0, "Line currents (demand), A", bold);
    for (PhaseDemand line : demand.phases()) {
      Row row = sheet.createRow(r++);
      text(row, 0, "Line " + lineName(system, line.phase()), null);
      Cell value = row.createCell(1);
      value.setCellValue(line.currentAmps());
      value.setCellStyle(amps);
    }
    Row neutral = sheet.createRow(r++);
    text(neutral, 0, "Neutral", null);
    Cell value = neutral.createCell(1);
    value.setCellValue(demand.neutralCurrentAmps());
    value.setCellStyle(amps);
    return r;
  }

  private static String lineName(SupplySystem system, Phase phase) {
    return system.lineName(phase);
  }

  private static void text(Row row, int column, String value, CellStyle style) {
    Cell cell = row.createCell(column);
    cell.setCellValue(value);
    if (style != null) {
      cell.setCellStyle(style);
    }
  }
}
