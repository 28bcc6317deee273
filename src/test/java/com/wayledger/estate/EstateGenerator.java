package com.wayledger.estate;

import com.wayledger.WayledgerApplication;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.Random;
import org.springframework.boot.WebApplicationType;
import org.springframework.boot.builder.SpringApplicationBuilder;

/**
 * Fills an empty database with a generated estate (invented data, fixed seed): by default 500
 * sites, each with 20 three-phase boards (one main board feeding 19 sub-boards) of 50 single-pole
 * circuits with one load each — 10,000 boards and 500,000 circuits. Rows go in by JDBC batches with
 * explicit ids; the schema comes from starting the application once (its own migrations). Test
 * scope only; run by {@code src/benchmark/estate.sh}, never by {@code ./mvnw verify}.
 *
 * <pre>
 * java -cp ... com.wayledger.estate.EstateGenerator jdbc:postgresql://127.0.0.1:5432/db user password
 *     [sites=500] [boardsPerSite=20] [circuitsPerBoard=50] [seed=20261202]
 * </pre>
 */
public final class EstateGenerator {

  private static final String[] CATEGORIES = {
    "LIGHTING", "SOCKET_OUTLETS", "SPACE_HEATING", "FIXED_APPLIANCE", "IT_SMALL_POWER", "MOTOR"
  };
  private static final String[] PHASES = {"L1", "L2", "L3"};
  private static final String[] STREETS = {
    "Tallow Lane", "Quarry Road", "Harbour Row", "Mill Street", "Kiln Yard", "Ropewalk"
  };

  private EstateGenerator() {}

  public static void main(String[] args) throws SQLException {
    String url = args[0];
    String user = args.length > 1 ? args[1] : "postgres";
    String password = args.length > 2 ? args[2] : "";
    int sites = args.length > 3 ? Integer.parseInt(args[3]) : 500;
    int boardsPerSite = args.length > 4 ? Integer.parseInt(args[4]) : 20;
    int circuitsPerBoard = args.length > 5 ? Integer.parseInt(args[5]) : 50;
    long seed = args.length > 6 ? Long.parseLong(args[6]) : 20261202L;
    if (circuitsPerBoard > 72) {
      throw new IllegalArgumentException("a 24-way three-phase board holds at most 72 circuits");
    }
    // The application itself migrates the schema (its Java migrations included), then stops.
    new SpringApplicationBuilder(WayledgerApplication.class)
        .web(
            WebApplicationType
                .SERVLET) // the security setup needs the web layer; loopback, any free port
        .run(
            "--server.port=0",
            "--server.address=127.0.0.1",
            "--spring.datasource.url=" + url,
            "--spring.datasource.username=" + user,
            "--spring.datasource.password=" + password,
            "--logging.level.root=WARN")
        .close();
    long started = System.nanoTime();
    try (Connection db = DriverManager.getConnection(url, user, password)) {
      db.setAutoCommit(false);
      try (Statement check = db.createStatement();
          var rows = check.executeQuery("SELECT COUNT(*) FROM site")) {
        rows.next();
        if (rows.getLong(1) > 0) {
          System.out.println("The database already holds sites; nothing generated.");
          return;
        }
      }
      generate(db, new Random(seed), sites, boardsPerSite, circuitsPerBoard);
      for (String table : new String[] {"site", "board", "circuit", "load_item"}) {
        try (Statement restart = db.createStatement();
            var max = restart.executeQuery("SELECT COALESCE(MAX(id), 0) + 1 FROM " + table)) {
          max.next();
          long next = max.getLong(1);
          try (Statement alter = db.createStatement()) {
            alter.execute("ALTER TABLE " + table + " ALTER COLUMN id RESTART WITH " + next);
          }
        }
      }
      db.commit();
    }
    System.out.printf(
        "Generated %d sites, %d boards, %d circuits in %.1f s%n",
        sites,
        sites * boardsPerSite,
        (long) sites * boardsPerSite * circuitsPerBoard,
        (System.nanoTime() - started) / 1e9);
  }

  private static void generate(
      Connection db, Random random, int sites, int boardsPerSite, int circuitsPerBoard)
      throws SQLException {
    try (PreparedStatement site =
            db.prepareStatement(
                "INSERT INTO site (id, name, address, earthing_system, nominal_voltage_volts, phases,"
                    + " frequency_hertz, external_loop_impedance_ohms,"
                    + " prospective_fault_current_kiloamps, supply_fuse_rating_amps)"
                    + " VALUES (?, ?, ?, 'TN_C_S', 230, 3, 50, 0.35, 16, 400)");
        PreparedStatement board =
            db.prepareStatement(
                "INSERT INTO board (id, site_id, reference, location, phases, way_count,"
                    + " busbar_rating_amps, incomer_kind, incomer_rating_amps, incomer_poles,"
                    + " incomer_breaking_capacity_kiloamps, parent_board_id, fed_from_circuit_id,"
                    + " submain_line_csa_mm2, submain_cpc_csa_mm2, submain_material,"
                    + " submain_insulation, submain_length_metres, submain_installation_method)"
                    + " VALUES (?, ?, ?, ?, 3, 24, ?, 'MCCB', ?, 3, 25, ?, ?, ?, ?, ?, ?, ?, ?)");
        PreparedStatement circuit =
            db.prepareStatement(
                "INSERT INTO circuit (id, board_id, way_number, position, description, status,"
                    + " device_kind, device_curve, device_rating_amps, device_poles,"
                    + " device_breaking_capacity_kiloamps, cable_line_csa_mm2, cable_cpc_csa_mm2,"
                    + " cable_material, cable_insulation, cable_length_metres,"
                    + " cable_installation_method)"
                    + " VALUES (?, ?, ?, ?, ?, ?, 'MCB', 'B', ?, 1, 10, ?, ?, 'COPPER',"
                    + " 'THERMOPLASTIC_70', ?, 'C')");
        PreparedStatement feed =
            db.prepareStatement("UPDATE board SET fed_from_circuit_id = ? WHERE id = ?");
        PreparedStatement slot =
            db.prepareStatement(
                "INSERT INTO way_slot (board_id, way_number, phase, circuit_id) VALUES (?, ?, ?, ?)");
        PreparedStatement load =
            db.prepareStatement(
                "INSERT INTO load_item (id, circuit_id, line_number, description, category, quantity,"
                    + " rating_value, rating_unit, power_factor) VALUES (?, ?, 1, ?, ?, 1, ?, 'W', ?)")) {
      long boardId = 0;
      long circuitId = 0;
      for (int s = 1; s <= sites; s++) {
        site.setLong(1, s);
        site.setString(2, String.format("Estate site %03d", s));
        site.setString(3, (1 + random.nextInt(200)) + " " + STREETS[s % STREETS.length]);
        site.addBatch();
        long mainBoard = 0;
        int feederWay = 0;
        for (int b = 0; b < boardsPerSite; b++) {
          boardId++;
          boolean main = b == 0;
          long feeder;
          if (main) {
            mainBoard = boardId;
            feeder = 0;
          } else {
            // a three-pole way of the main board feeds this sub-board
            feederWay++;
            circuitId++;
            feeder = circuitId;
            addCircuit(
                circuit, circuitId, mainBoard, feederWay, "THREE_POLE", "Submain", 63, 16, 16, 25);
            for (String phase : PHASES) {
              addSlot(slot, mainBoard, feederWay, phase, circuitId);
            }
          }
          board.setLong(1, boardId);
          board.setLong(2, s);
          board.setString(3, main ? "MDB" : String.format("DB-%02d", b));
          board.setString(4, main ? "Intake room" : "Floor " + b);
          board.setDouble(5, main ? 400 : 100);
          board.setDouble(6, main ? 400 : 63);
          if (main) {
            board.setNull(7, java.sql.Types.BIGINT);
            board.setNull(8, java.sql.Types.BIGINT);
            board.setNull(9, java.sql.Types.DOUBLE);
            board.setNull(10, java.sql.Types.DOUBLE);
            board.setNull(11, java.sql.Types.VARCHAR);
            board.setNull(12, java.sql.Types.VARCHAR);
            board.setNull(13, java.sql.Types.DOUBLE);
            board.setNull(14, java.sql.Types.VARCHAR);
          } else {
            board.setLong(7, mainBoard);
            board.setNull(8, java.sql.Types.BIGINT); // set once the feeder circuit is stored
            feed.setLong(1, feeder);
            feed.setLong(2, boardId);
            feed.addBatch();
            board.setDouble(9, 16);
            board.setDouble(10, 16);
            board.setString(11, "COPPER");
            board.setString(12, "THERMOPLASTIC_70");
            board.setDouble(13, 10 + random.nextInt(60));
            board.setString(14, "C");
          }
          board.addBatch();
        }
        // sub-board circuits; the main board only holds the feeders
        for (long sub = mainBoard + 1; sub <= boardId; sub++) {
          for (int c = 0; c < circuitsPerBoard; c++) {
            circuitId++;
            int way = c / 3 + 1;
            String phase = PHASES[c % 3];
            String category = CATEGORIES[random.nextInt(CATEGORIES.length)];
            double watts = 200 + random.nextInt(2800);
            addCircuit(
                circuit,
                circuitId,
                sub,
                way,
                phase,
                category.toLowerCase() + " " + way,
                16,
                2.5,
                1.5,
                5 + random.nextInt(40));
            addSlot(slot, sub, way, phase, circuitId);
            load.setLong(1, circuitId);
            load.setLong(2, circuitId);
            load.setString(3, "Load " + way + phase);
            load.setString(4, category);
            load.setDouble(5, watts);
            load.setDouble(6, category.equals("MOTOR") ? 0.85 : 0.95);
            load.addBatch();
          }
        }
        site.executeBatch();
        board.executeBatch();
        circuit.executeBatch();
        feed.executeBatch();
        slot.executeBatch();
        load.executeBatch();
        if (s % 50 == 0) {
          db.commit();
          System.out.printf("  %d sites%n", s);
        }
      }
    }
  }

  private static void addCircuit(
      PreparedStatement circuit,
      long id,
      long boardId,
      int way,
      String position,
      String description,
      double ratingAmps,
      double lineCsa,
      double cpcCsa,
      double lengthMetres)
      throws SQLException {
    circuit.setLong(1, id);
    circuit.setLong(2, boardId);
    circuit.setInt(3, way);
    circuit.setString(4, position);
    circuit.setString(5, description);
    circuit.setString(6, "IN_USE");
    circuit.setDouble(7, ratingAmps);
    circuit.setDouble(8, lineCsa);
    circuit.setDouble(9, cpcCsa);
    circuit.setDouble(10, lengthMetres);
    circuit.addBatch();
  }

  private static void addSlot(
      PreparedStatement slot, long boardId, int way, String phase, long circuitId)
      throws SQLException {
    slot.setLong(1, boardId);
    slot.setInt(2, way);
    slot.setString(3, phase);
    slot.setLong(4, circuitId);
    slot.addBatch();
  }
}
