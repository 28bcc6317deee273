package com.wayledger.board;

import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.RatingUnit;
import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.FetchType;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.JoinColumn;
import jakarta.persistence.ManyToOne;
import jakarta.persistence.Table;
import jakarta.persistence.Version;

/** One line of a circuit's load list: a number of identical items with one nameplate rating. */
@Entity
@Table(name = "load_item")
public class LoadItem {

  @Id
  @GeneratedValue(strategy = GenerationType.IDENTITY)
  private Long id;

  @ManyToOne(fetch = FetchType.LAZY, optional = false)
  @JoinColumn(name = "circuit_id")
  private Circuit circuit;

  private int lineNumber;
  private String description;

  @Enumerated(EnumType.STRING)
  private LoadCategory category;

  private int quantity;
  private double ratingValue;

  @Enumerated(EnumType.STRING)
  private RatingUnit ratingUnit;

  private double powerFactor;

  @Column(name = "surge_multiple")
  private Double startUpSurgeMultiple;

  @Column(name = "surge_millis")
  private Double startUpSurgeMillis;

  private boolean continuous;

  /** Rated horsepower of one motor (NEC Tables 430.248/430.250); null when not recorded. */
  @Column(name = "motor_horsepower")
  private Double motorHorsepower;

  /** This line's own version: edits of other lines or of the circuit do not move it. */
  @Version private long version;

  protected LoadItem() {}

  LoadItem(LoadForm form) {
    apply(form);
  }

  void attachTo(Circuit owner, int line) {
    circuit = owner;
    lineNumber = line;
  }

  void apply(LoadForm form) {
    description = form.description().strip();
    category = form.category();
    quantity = form.quantity();
    ratingValue = form.ratingValue();
    ratingUnit = form.ratingUnit();
    powerFactor = form.powerFactor();
    startUpSurgeMultiple = form.startUpSurgeMultiple();
    startUpSurgeMillis = form.startUpSurgeMillis();
    continuous = Boolean.TRUE.equals(form.continuous());
    motorHorsepower = form.motorHorsepower();
  }

  /** "2 × 3 kW" style summary for the schedule. */
  public String ratingLabel() {
    String unit =
        switch (ratingUnit) {
          case W -> " W";
          case VA -> " VA";
          case A -> " A";
        };
    return (quantity > 1 ? quantity + " × " : "") + Numbers.plain(ratingValue) + unit;
  }

  public Long getId() {
    return id;
  }

  public Circuit getCircuit() {
    return circuit;
  }

  public int getLineNumber() {
    return lineNumber;
  }

  public String getDescription() {
    return description;
  }

  public LoadCategory getCategory() {
    return category;
  }

  public int getQuantity() {
    return quantity;
  }

  public double getRatingValue() {
    return ratingValue;
  }

  public RatingUnit getRatingUnit() {
    return ratingUnit;
  }

  public double getPowerFactor() {
    return powerFactor;
  }

  public Double getStartUpSurgeMultiple() {
    return startUpSurgeMultiple;
  }

  public Double getStartUpSurgeMillis() {
    return startUpSurgeMillis;
  }

  public boolean isContinuous() {
    return continuous;
  }

  public Double getMotorHorsepower() {
    return motorHorsepower;
  }

  public long getVersion() {
    return version;
  }
}
