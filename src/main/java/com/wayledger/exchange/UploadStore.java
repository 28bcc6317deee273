package com.wayledger.exchange;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.security.SecureRandom;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Properties;
import java.util.regex.Pattern;
import org.springframework.stereotype.Component;

/**
 * Keeps an uploaded file between the import steps in a temporary file named by a random token, with
 * a small side file for the board, the uploader and the chosen mapping. Sessions live in the
 * database, so the file itself never goes into the session. Uploads older than two hours are
 * removed.
 */
@Component
public class UploadStore {

  private static final Pattern TOKEN = Pattern.compile("[0-9a-f]{32}");
  private static final Duration KEEP = Duration.ofHours(2);

  /** How many parsed sheets are kept in memory, most recently used first. */
  static final int TABLES_KEPT = 16;

  private final SecureRandom random = new SecureRandom();

  /**
   * Parsed sheets by token and sheet index, so each step of an import reuses the table instead of
   * parsing the file again (an instance restarted or another replica parses it once more).
   */
  private final Map<String, SheetTable> tables =
      java.util.Collections.synchronizedMap(
          new LinkedHashMap<>(TABLES_KEPT, 0.75f, true) {
            @Override
            protected boolean removeEldestEntry(Map.Entry<String, SheetTable> eldest) {
              return size() > TABLES_KEPT;
            }
          });

  private final Path directory;

  public UploadStore() throws IOException {
    this(Files.createTempDirectory("wayledger-import-"));
  }

  UploadStore(Path directory) {
    this.directory = directory;
  }

  /** What is known about an upload. */
  public record Upload(
      String token,
      long boardId,
      String owner,
      String fileName,
      int sheetIndex,
      List<ImportField> mapping) {

    Upload withMapping(int sheet, List<ImportField> fields) {
      return new Upload(token, boardId, owner, fileName, sheet, List.copyOf(fields));
    }
  }

  public Upload save(long boardId, String owner, String fileName, byte[] bytes) {
    removeOld();
    byte[] raw = new byte[16];
    random.nextBytes(raw);
    String token = HexFormat.of().formatHex(raw);
    try {
      Files.write(directory.resolve(token + ".bin"), bytes);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    Upload upload =
        new Upload(token, boardId, owner, fileName == null ? "" : fileName, -1, List.of());
    update(upload);
    return upload;
  }

  public void update(Upload upload) {
    Properties properties = new Properties();
    properties.setProperty("boardId", Long.toString(upload.boardId()));
    properties.setProperty("owner", upload.owner());
    properties.setProperty("fileName", upload.fileName());
    properties.setProperty("sheet", Integer.toString(upload.sheetIndex()));
    properties.setProperty(
        "mapping", String.join(",", upload.mapping().stream().map(Enum::name).toList()));
    try (OutputStream out =
        Files.newOutputStream(directory.resolve(upload.token() + ".properties"))) {
      properties.store(out, null);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /**
   * The upload of this token for this board and user; empty when unknown, expired or someone
   * else's.
   */
  public Optional<Upload> find(String token, long boardId, String owner) {
    if (token == null || !TOKEN.matcher(token).matches()) {
      return Optional.empty();
    }
    Path side = directory.resolve(token + ".properties");
    if (!Files.exists(side)) {
      return Optional.empty();
    }
    Properties properties = new Properties();
    try (InputStream in = Files.newInputStream(side)) {
      properties.load(in);
    } catch (IOException e) {
      return Optional.empty();
    }
    if (Long.parseLong(properties.getProperty("boardId")) != boardId
        || !owner.equals(properties.getProperty("owner"))) {
      return Optional.empty();
    }
    List<ImportField> mapping = new ArrayList<>();
    String text = properties.getProperty("mapping", "");
    if (!text.isEmpty()) {
      for (String name : text.split(",")) {
        mapping.add(ImportField.valueOf(name));
      }
    }
    return Optional.of(
        new Upload(
            token,
            boardId,
            owner,
            properties.getProperty("fileName"),
            Integer.parseInt(properties.getProperty("sheet")),
            mapping));
  }

  /** The upload's sheet as a table, parsed once and then kept (see {@link #TABLES_KEPT}). */
  public SheetTable table(Upload upload, int sheetIndex) {
    String key = upload.token() + ":" + sheetIndex;
    SheetTable table = tables.get(key);
    if (table == null) {
      table = SpreadsheetReader.read(bytes(upload), upload.fileName(), sheetIndex);
      remember(upload, sheetIndex, table);
    }
    return table;
  }

  /** Keeps a table just parsed (under the index asked for and the one it resolved to). */
  public void remember(Upload upload, int sheetIndex, SheetTable table) {
    tables.put(upload.token() + ":" + sheetIndex, table);
    tables.put(upload.token() + ":" + table.sheetIndex(), table);
  }

  public byte[] bytes(Upload upload) {
    try {
      return Files.readAllBytes(directory.resolve(upload.token() + ".bin"));
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  public void remove(Upload upload) {
    tables.keySet().removeIf(key -> key.startsWith(upload.token() + ":"));
    try {
      Files.deleteIfExists(directory.resolve(upload.token() + ".bin"));
      Files.deleteIfExists(directory.resolve(upload.token() + ".properties"));
    } catch (IOException e) {
      // a leftover file is removed with the old ones later
    }
  }

  private void removeOld() {
    Instant cutoff = Instant.now().minus(KEEP);
    try (DirectoryStream<Path> files = Files.newDirectoryStream(directory)) {
      for (Path file : files) {
        FileTime modified = Files.getLastModifiedTime(file);
        if (modified.toInstant().isBefore(cutoff)) {
          Files.deleteIfExists(file);
        }
      }
    } catch (IOException e) {
      // best effort
    }
  }
}
