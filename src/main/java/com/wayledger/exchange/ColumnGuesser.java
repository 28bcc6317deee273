package com.wayledger.exchange;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.rules.CableUnits;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * Guesses what each column of a sheet means from its header words and a sample of its values. A
 * guess is only a proposal: the user confirms or changes every column before anything is read.
 */
public final class ColumnGuesser {

  private static final int SAMPLE_ROWS = 25;
  private static final Pattern DEVICE_TEXT =
      Pattern.compile(
          "(?i)^(MCB|RCBO|RCD|MCCB|FUSE|BS\\s?\\d+)?\\s*[BCD]\\s*\\d+(\\.\\d+)?\\s*A?(\\s*/?\\s*\\d+\\s*mA)?$");
  private static final Pattern NUMBER = Pattern.compile("^-?\\d+([.,]\\d+)?\\s*[a-zA-Z²Ω°%×]*$");

  private ColumnGuesser() {}

  /** One proposed field per column. */
  public static List<ImportField> guess(SheetTable table) {
    int columns = table.headers().size();
    if (table.isOwnExport()) {
      List<ImportField> own = new ArrayList<>(columns);
      for (String header : table.headers()) {
        ScheduleColumn column = ScheduleColumn.byHeader(header);
        own.add(column.isInput() ? ImportField.ofOwnHeader(header) : ImportField.IGNORE);
      }
      return own;
    }
    List<int[]> candidates = new ArrayList<>(); // {column, field ordinal, score}
    for (int c = 0; c < columns; c++) {
      List<String> sample = sample(table, c);
      for (ImportField field : ImportField.values()) {
        if (field == ImportField.IGNORE) {
          continue;
        }
        int score = headerScore(field, table.headers().get(c)) + valueScore(field, sample);
        if (score > 0) {
          candidates.add(new int[] {c, field.ordinal(), score});
        }
      }
    }
    candidates.sort(
        Comparator.comparingInt((int[] a) -> a[2]).reversed().thenComparingInt(a -> a[0]));
    ImportField[] chosen = new ImportField[columns];
    Arrays.fill(chosen, ImportField.IGNORE);
    Set<ImportField> used = EnumSet.noneOf(ImportField.class);
    for (int[] candidate : candidates) {
      ImportField field = ImportField.values()[candidate[1]];
      if (chosen[candidate[0]] != ImportField.IGNORE || used.contains(field) || candidate[2] < 30) {
        continue;
      }
      chosen[candidate[0]] = field;
      used.add(field);
    }
    return List.of(chosen);
  }

  /**
   * How many cells of a row read as known column headers; the header row is the row that scores
   * most.
   */
  static int headerScore(List<String> cells) {
    int known = 0;
    for (String cell : cells) {
      for (ImportField field : ImportField.values()) {
        if (field != ImportField.IGNORE && headerScore(field, cell) >= 40) {
          known++;
          break;
        }
      }
    }
    return known;
  }

  static int headerScore(ImportField field, String header) {
    if (header == null || header.isBlank()) {
      return 0;
    }
    if (field.ownHeader() != null && field.ownHeader().equalsIgnoreCase(header.strip())) {
      return 1000;
    }
    String text = normalise(header);
    List<String> tokens = List.of(text.split(" "));
    int best = 0;
    List<String> words = field.words();
    for (int k = 0; k < words.size(); k++) {
      String phrase = normalise(words.get(k));
      if (text.equals(phrase)) {
        best = Math.max(best, 100 - k);
      } else if (phrase.length() > 2) {
        List<String> wanted = List.of(phrase.split(" "));
        if (Collections.indexOfSubList(tokens, wanted) >= 0) {
          best = Math.max(best, 50 - k + 5 * wanted.size());
        }
      }
    }
    return best;
  }

  private static int valueScore(ImportField field, List<String> sample) {
    if (sample.isEmpty()) {
      return 0;
    }
    return switch (field) {
      case LINE -> all(sample, v -> Codes.parseLine(v) != null && !v.matches("\\d+")) ? 45 : 0;
      case CONNECTION -> all(sample, v -> Codes.parseConnection(v) != null) ? 40 : 0;
      case DEVICE_SUMMARY -> all(sample, v -> DEVICE_TEXT.matcher(v.strip()).matches()) ? 45 : 0;
      case CURVE -> all(sample, v -> v.strip().matches("(?i)[BCD]")) ? 35 : 0;
      case DEVICE -> all(sample, v -> Codes.parseEnum(DeviceKind.class, v) != null) ? 35 : 0;
      case CATEGORY -> all(sample, v -> Codes.parseEnum(LoadCategory.class, v) != null) ? 35 : 0;
      case UNIT -> all(sample, v -> Codes.parseEnum(RatingUnit.class, v) != null) ? 35 : 0;
      case WAY -> all(sample, v -> v.strip().matches("\\d+")) ? 5 : -60;
      case RATING_AMPS,
          BREAKING_KILOAMPS,
          RESIDUAL_MILLIAMPS,
          OVERLOAD_SETTING_AMPS,
          INSTANTANEOUS_SETTING_AMPS,
          LINE_CSA,
          CPC_CSA,
          LENGTH_METRES,
          LENGTH_FEET,
          AMBIENT_CELSIUS,
          GROUPED,
          THERMAL_INSULATION_MM,
          MEASURED_ZS,
          QUANTITY,
          RATING,
          SURGE_MULTIPLE,
          SURGE_MILLIS,
          POLES,
          LOAD_KILOWATTS,
          LOAD_WATTS,
          LOAD_AMPS ->
          all(sample, v -> NUMBER.matcher(v.strip()).matches()) ? 0 : -60;
      case LINE_AWG, CPC_AWG ->
          all(sample, v -> CableUnits.squareMillimetresOfAwg(v).isPresent()) ? 35 : 0;
      case POWER_FACTOR -> all(sample, v -> v.strip().matches("0?[.,]\\d+|1([.,]0+)?")) ? 5 : -60;
      default -> 0;
    };
  }

  private static boolean all(List<String> values, java.util.function.Predicate<String> test) {
    return values.stream().allMatch(test);
  }

  private static List<String> sample(SheetTable table, int column) {
    List<String> values = new ArrayList<>();
    for (SheetTable.Row row : table.rows()) {
      String value = row.cell(column);
      if (!value.isBlank()) {
        values.add(value);
        if (values.size() == SAMPLE_ROWS) {
          break;
        }
      }
    }
    return values;
  }

  static String normalise(String header) {
    String text =
        header
            .toLowerCase(Locale.ROOT)
            .replace("²", "2")
            .replace("ω", " ohm")
            .replace("°", " ")
            .replace("×", " x ")
            .replaceAll("[()\\[\\]/.,:;_\\-–'\"]", " ")
            .replaceAll("\\s+", " ")
            .strip();
    return text;
  }

  private static final class Collections {
    static int indexOfSubList(List<String> source, List<String> target) {
      return java.util.Collections.indexOfSubList(source, target);
    }
  }
}
