package com.wayledger.engine.protection.data;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/**
 * A numeric table read from a classpath CSV file. Lines starting with {@code #} are provenance
 * notes (source, confidence) kept in {@link #notes()}; the first other line is the header; an empty
 * cell is NaN (no value). The first column is the key, ascending.
 */
public final class DataTable {

  private final String resource;
  private final List<String> notes;
  private final List<String> header;
  private final List<double[]> rows;

  private DataTable(String resource, List<String> notes, List<String> header, List<double[]> rows) {
    this.resource = resource;
    this.notes = List.copyOf(notes);
    this.header = List.copyOf(header);
    this.rows = List.copyOf(rows);
  }

  /**
   * Reads {@code engine/protection/<name>} from the classpath. A missing or malformed file is a
   * packaging error, not a user-data problem, so it fails loudly.
   */
  public static DataTable load(String name) {
    String resource = "/engine/protection/" + name;
    try (InputStream in = DataTable.class.getResourceAsStream(resource)) {
      if (in == null) {
        throw new IllegalStateException("data table not on the classpath: " + resource);
      }
      BufferedReader reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
      List<String> notes = new ArrayList<>();
      List<String> header = null;
      List<double[]> rows = new ArrayList<>();
      String line;
      while ((line = reader.readLine()) != null) {
        if (line.isBlank()) {
          continue;
        }
        if (line.startsWith("#")) {
          notes.add(line.substring(1).trim());
        } else if (header == null) {
          header = List.of(line.split(",", -1));
        } else {
          rows.add(parseRow(line, header.size(), resource));
        }
      }
      if (header == null) {
        throw new IllegalStateException("data table has no header: " + resource);
      }
      return new DataTable(resource, notes, header, rows);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  private static double[] parseRow(String line, int width, String resource) {
    String[] cells = line.split(",", -1);
    if (cells.length != width) {
      throw new IllegalStateException(
          "row width " + cells.length + " ≠ header width " + width + " in " + resource);
    }
    double[] row = new double[width];
    for (int i = 0; i < width; i++) {
      row[i] = cells[i].isBlank() ? Double.NaN : Double.parseDouble(cells[i].trim());
    }
    return row;
  }

  public String resource() {
    return resource;
  }

  /** Comment lines of the file: source, confidence and how to read it. */
  public List<String> notes() {
    return notes;
  }

  public boolean hasColumn(String column) {
    return header.contains(column);
  }

  /**
   * The value in {@code column} on the row whose key equals {@code key}; NaN when no such row or
   * cell.
   */
  public double exact(double key, String column) {
    int c = header.indexOf(column);
    if (c < 0) {
      return Double.NaN;
    }
    for (double[] row : rows) {
      if (Math.abs(row[0] - key) < 1e-9) {
        return row[c];
      }
    }
    return Double.NaN;
  }

  /**
   * The value in {@code column} on the first row whose key is at least {@code key} (the next row
   * up, which is the conservative reading for correction factors that fall as the key rises); NaN
   * when the key is beyond the table.
   */
  public double atOrAbove(double key, String column) {
    int c = header.indexOf(column);
    if (c < 0) {
      return Double.NaN;
    }
    for (double[] row : rows) {
      if (row[0] >= key - 1e-9) {
        return row[c];
      }
    }
    return Double.NaN;
  }

  /** The value on the last row (the largest key). */
  public double last(String column) {
    return rows.get(rows.size() - 1)[header.indexOf(column)];
  }

  /** The keys (first column), ascending. */
  public double[] keys() {
    return rows.stream().mapToDouble(r -> r[0]).toArray();
  }
}
