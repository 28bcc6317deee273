package com.wayledger.board;

import com.wayledger.engine.dwelling.DwellingAddition;
import com.wayledger.engine.dwelling.DwellingInputs;
import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.Id;
import jakarta.persistence.PrePersist;
import jakarta.persistence.PreUpdate;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.time.Instant;

/**
 * The NEC dwelling inputs of a board that serves one dwelling unit: floor area (stored in ft², the
 * unit of NEC 220.12), small-appliance and laundry branch circuits, whether the optional method and
 * the addition method are worked. Its own row with its own version, so that an edit of the dwelling
 * data and an edit of the board's schedule never refuse each other; only dwelling boards have one.
 */
@Entity
@Table(name = "board_dwelling")
public class DwellingRecord {

  @Id private Long boardId;

  @Column(name = "floor_area_square_feet")
  private Double floorAreaSquareFeet;

  private Integer smallApplianceCircuits;
  private Integer laundryCircuits;
  private boolean optionalMethod;

  @Enumerated(EnumType.STRING)
  private DwellingAddition addition = DwellingAddition.NONE;

  @Version private long version;

  private Instant updatedAt;

  protected DwellingRecord() {}

  DwellingRecord(long boardId) {
    this.boardId = boardId;
  }

  @PrePersist
  @PreUpdate
  void touch() {
    updatedAt = Instant.now();
  }

  void apply(DwellingForm form) {
    floorAreaSquareFeet = form.floorAreaSquareFeetValue();
    smallApplianceCircuits = form.smallApplianceCircuits();
    laundryCircuits = form.laundryCircuits();
    optionalMethod = form.optionalMethodChosen();
    addition = form.addition() == null ? DwellingAddition.NONE : form.addition();
  }

  /** The inputs as the engine sees them. */
  public DwellingInputs inputs() {
    return new DwellingInputs(
        floorAreaSquareFeet, smallApplianceCircuits, laundryCircuits, optionalMethod, addition);
  }

  public Long getBoardId() {
    return boardId;
  }

  public Double getFloorAreaSquareFeet() {
    return floorAreaSquareFeet;
  }

  public Integer getSmallApplianceCircuits() {
    return smallApplianceCircuits;
  }

  public Integer getLaundryCircuits() {
    return laundryCircuits;
  }

  public boolean isOptionalMethod() {
    return optionalMethod;
  }

  public DwellingAddition getAddition() {
    return addition;
  }

  public long getVersion() {
    return version;
  }

  public Instant getUpdatedAt() {
    return updatedAt;
  }
}
