package com.wayledger.board;

import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.FaultInterrupter;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.WayStatus;
import jakarta.persistence.AttributeOverride;
import jakarta.persistence.AttributeOverrides;
import jakarta.persistence.CascadeType;
import jakarta.persistence.Column;
import jakarta.persistence.Embedded;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.JoinColumn;
import jakarta.persistence.ManyToOne;
import jakarta.persistence.OneToMany;
import jakarta.persistence.OrderBy;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.util.ArrayList;
import java.util.List;
import org.hibernate.annotations.OptimisticLock;

/** What one position (or three positions, for a three-pole device) of a board holds. */
@Entity
@Table(name = "circuit")
public class Circuit {

  @Id
  @GeneratedValue(strategy = GenerationType.IDENTITY)
  private Long id;

  @ManyToOne(optional = false)
  @JoinColumn(name = "board_id")
  private Board board;

  private int wayNumber;

  /** The position, or for a two-pole circuit the first of its two lines (see lineToLine). */
  @Enumerated(EnumType.STRING)
  private PhasePosition position;

  /** Whether the circuit is two-pole, line to line, from {@link #position} to the next line. */
  private boolean lineToLine;

  private String description;

  @Enumerated(EnumType.STRING)
  private WayStatus status;

  private boolean lockedForBalancing;

  private boolean ringFinal;

  @Enumerated(EnumType.STRING)
  private CircuitLocation location;

  @Embedded
  @AttributeOverrides({
    @AttributeOverride(name = "kind", column = @Column(name = "device_kind")),
    @AttributeOverride(name = "curve", column = @Column(name = "device_curve")),
    @AttributeOverride(name = "ratingAmps", column = @Column(name = "device_rating_amps")),
    @AttributeOverride(name = "poles", column = @Column(name = "device_poles")),
    @AttributeOverride(
        name = "breakingCapacityKiloAmps",
        column = @Column(name = "device_breaking_capacity_kiloamps")),
    @AttributeOverride(
        name = "residualMilliAmps",
        column = @Column(name = "device_residual_milliamps")),
    @AttributeOverride(name = "rcdType", column = @Column(name = "device_rcd_type")),
    @AttributeOverride(
        name = "overloadSettingAmps",
        column = @Column(name = "device_overload_setting_amps")),
    @AttributeOverride(
        name = "instantaneousSettingAmps",
        column = @Column(name = "device_instantaneous_setting_amps"))
  })
  private DeviceDetails device;

  @Embedded
  @AttributeOverrides({
    @AttributeOverride(
        name = "lineCsaSquareMillimetres",
        column = @Column(name = "cable_line_csa_mm2")),
    @AttributeOverride(
        name = "protectiveCsaSquareMillimetres",
        column = @Column(name = "cable_cpc_csa_mm2")),
    @AttributeOverride(name = "material", column = @Column(name = "cable_material")),
    @AttributeOverride(name = "insulation", column = @Column(name = "cable_insulation")),
    @AttributeOverride(name = "lengthMetres", column = @Column(name = "cable_length_metres")),
    @AttributeOverride(
        name = "installationMethod",
        column = @Column(name = "cable_installation_method")),
    @AttributeOverride(name = "ambientCelsius", column = @Column(name = "cable_ambient_celsius")),
    @AttributeOverride(name = "groupedCircuits", column = @Column(name = "cable_grouped_circuits")),
    @AttributeOverride(
        name = "thermalInsulationMillimetres",
        column = @Column(name = "cable_thermal_insulation_mm"))
  })
  private CableDetails cable;

  @Column(name = "measured_zs_ohms")
  private Double measuredLoopImpedanceOhms;

  /** The device's GFCI/AFCI function (NEC set); null for none (migration V18). */
  @Enumerated(EnumType.STRING)
  @Column(name = "device_fault_interrupter")
  private FaultInterrupter faultInterrupter;

  /** The conduit the cable runs in (NEC Chapter 9 Table 9); null when not recorded (V25). */
  @Enumerated(EnumType.STRING)
  @Column(name = "cable_conduit")
  private com.wayledger.engine.Conduit conduit;

  @Version private long version;

  // Load lines carry their own versions: adding or editing one must not move the circuit's.
  @OneToMany(mappedBy = "circuit", cascade = CascadeType.ALL, orphanRemoval = true)
  @OptimisticLock(excluded = true)
  @OrderBy("lineNumber")
  private List<LoadItem> loads = new ArrayList<>();

  protected Circuit() {}

  Circuit(Board board) {
    this.board = board;
  }

  /** Copies the circuit's own fields (not its loads) from a validated form. */
  void apply(CircuitForm form) {
    wayNumber = form.wayNumber();
    // on a panelboard the form gives the first space and the poles; the lines follow from them
    place(
        board.isPanelboard()
            ? board.panelSpaces().positionOf(form.wayNumber(), form.position().poles())
            : form.position());
    description = form.description().strip();
    status = form.status();
    lockedForBalancing = Boolean.TRUE.equals(form.lockedForBalancing());
    ringFinal = Boolean.TRUE.equals(form.ringFinal());
    location = form.location();
    device = status == WayStatus.EMPTY ? null : form.deviceDetails();
    faultInterrupter = status == WayStatus.EMPTY ? null : form.deviceFaultInterrupter();
    cable = status == WayStatus.IN_USE ? form.cableDetails() : null;
    conduit = status == WayStatus.IN_USE ? form.cableConduit() : null;
    measuredLoopImpedanceOhms = form.measuredLoopImpedanceOhms();
  }

  void moveTo(int newWayNumber, PhasePosition newPosition) {
    wayNumber = newWayNumber;
    place(newPosition);
  }

  /** Stores a two-pole position as its first line with the line-to-line mark (migration V13). */
  private void place(PhasePosition newPosition) {
    lineToLine = newPosition != null && newPosition.isLineToLine();
    position = lineToLine ? PhasePosition.on(newPosition.fromLine()) : newPosition;
  }

  void replaceDevice(DeviceDetails newDevice, FaultInterrupter newFunction) {
    device = newDevice;
    faultInterrupter = newFunction;
  }

  /** Sets the line conductors' size and metal (a proposal's conductor), keeping the rest. */
  void replaceConductor(Double lineCsaSquareMillimetres, com.wayledger.engine.ConductorMaterial m) {
    cable = CableDetails.withConductor(cable, lineCsaSquareMillimetres, m);
  }

  /** The conduit the cable runs in; null when not recorded. */
  public com.wayledger.engine.Conduit getConduit() {
    return conduit;
  }

  /** The device's GFCI/AFCI function; null for none. */
  public FaultInterrupter getFaultInterrupter() {
    return faultInterrupter;
  }

  void addLoad(LoadItem load) {
    load.attachTo(this, loads.stream().mapToInt(LoadItem::getLineNumber).max().orElse(0) + 1);
    loads.add(load);
  }

  /**
   * Label of the position: "3 L2", or "3 L1–L3" for a three-pole device, or "3" on a single-phase
   * board.
   */
  public String positionLabel() {
    if (board.isPanelboard()) {
      return spacesLabel() + " " + linesLabel();
    }
    if (board.lineCount() == 1) {
      return Integer.toString(wayNumber);
    }
    return wayNumber + " " + getPosition().label();
  }

  /** On a panelboard the spaces the breaker takes, "3" or "3/5"; else the way number. */
  public String spacesLabel() {
    com.wayledger.engine.PanelSpaces panel = board.panelSpaces();
    int poles = getPosition().poles();
    if (panel == null
        || panel.fitOf(wayNumber, poles) != com.wayledger.engine.PanelSpaces.Fit.FITS) {
      return Integer.toString(wayNumber);
    }
    return panel.spacesOf(wayNumber, poles).stream()
        .map(String::valueOf)
        .collect(java.util.stream.Collectors.joining("/"));
  }

  /**
   * The lines the circuit takes in the names people use on its board: "B", "A–B", "C–A" or "A–B–C"
   * on a panelboard (in the order of its spaces), "L1–L2" on an IEC board.
   */
  public String linesLabel() {
    com.wayledger.engine.PanelSpaces panel = board.panelSpaces();
    int poles = getPosition().poles();
    if (panel == null
        || panel.fitOf(wayNumber, poles) != com.wayledger.engine.PanelSpaces.Fit.FITS) {
      return getPosition().label();
    }
    return panel.spacesOf(wayNumber, poles).stream()
        .map(space -> board.lineName(panel.lineOf(space)))
        .collect(java.util.stream.Collectors.joining("–"));
  }

  public Long getId() {
    return id;
  }

  public Board getBoard() {
    return board;
  }

  public int getWayNumber() {
    return wayNumber;
  }

  public PhasePosition getPosition() {
    return lineToLine && position != null && position.isSinglePole()
        ? PhasePosition.twoPoleFrom(com.wayledger.engine.Phase.valueOf(position.name()))
        : position;
  }

  public String getDescription() {
    return description;
  }

  public WayStatus getStatus() {
    return status;
  }

  public boolean isLockedForBalancing() {
    return lockedForBalancing;
  }

  /** Whether the cable is a ring final circuit: it leaves the board and returns to it. */
  public boolean isRingFinal() {
    return ringFinal;
  }

  /** Where the circuit's equipment is, for the residual-current rules; null when not recorded. */
  public CircuitLocation getLocation() {
    return location;
  }

  public DeviceDetails getDevice() {
    return device;
  }

  public CableDetails getCable() {
    return cable;
  }

  public Double getMeasuredLoopImpedanceOhms() {
    return measuredLoopImpedanceOhms;
  }

  public long getVersion() {
    return version;
  }

  public List<LoadItem> getLoads() {
    return loads;
  }

  /**
   * The circuit's edition as an export carries it: its own version and a digest of its load lines'
   * ids and versions (load lines carry their own versions, so an edit of a load does not move the
   * circuit's). A schedule brought back from a spreadsheet is refused for a circuit whose edition
   * is no longer the one written in the file, so an edit made since the export is never
   * overwritten.
   */
  public String recordVersion() {
    StringBuilder lines = new StringBuilder();
    for (LoadItem load : loads) {
      lines.append(load.getId()).append('.').append(load.getVersion()).append(';');
    }
    try {
      byte[] digest =
          java.security.MessageDigest.getInstance("SHA-256")
              .digest(lines.toString().getBytes(java.nio.charset.StandardCharsets.UTF_8));
      return version + "-" + java.util.HexFormat.of().formatHex(digest, 0, 3);
    } catch (java.security.NoSuchAlgorithmException impossible) {
      throw new IllegalStateException(impossible);
    }
  }
}
