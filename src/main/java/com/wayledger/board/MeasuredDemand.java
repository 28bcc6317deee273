package com.wayledger.board;

import com.wayledger.engine.dwelling.MeasuredMaximumDemand;
import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import java.time.Instant;
import java.time.LocalDate;

/**
 * A maximum demand a facility manager recorded for a board over a period (NEC 220.87). Append-only
 * like the change log: the application never updates or deletes one, and on PostgreSQL a trigger
 * refuses it (migration 17). A later record with other figures stands beside the earlier one.
 */
@Entity
@Table(name = "measured_demand")
public class MeasuredDemand {

  /** Units a maximum demand is recorded in. */
  public enum Unit {
    KVA,
    KW
  }

  @Id
  @GeneratedValue(strategy = GenerationType.IDENTITY)
  private Long id;

  @Column(updatable = false)
  private long siteId;

  @Column(updatable = false)
  private long boardId;

  @Column(updatable = false)
  private Instant recordedAt;

  @Column(updatable = false)
  private String username;

  @Column(updatable = false)
  private LocalDate periodStart;

  @Column(updatable = false)
  private LocalDate periodEnd;

  @Column(updatable = false)
  private LocalDate peakOn;

  @Column(updatable = false)
  private double maximumDemand;

  @Column(name = "demand_unit", updatable = false)
  @jakarta.persistence.Enumerated(jakarta.persistence.EnumType.STRING)
  private Unit unit;

  @Column(updatable = false)
  private Integer intervalMinutes;

  @Column(updatable = false)
  private String note;

  protected MeasuredDemand() {}

  MeasuredDemand(long siteId, long boardId, String username, MeasuredDemandForm form) {
    this.siteId = siteId;
    this.boardId = boardId;
    this.username = username;
    this.recordedAt = Instant.now();
    this.periodStart = form.periodStart();
    this.periodEnd = form.periodEnd();
    this.peakOn = form.peakOn();
    this.maximumDemand = form.maximumDemand();
    this.unit = form.unit();
    this.intervalMinutes = form.intervalMinutes();
    this.note = form.note() == null || form.note().isBlank() ? null : form.note().strip();
  }

  /** The record as the engine sees it. */
  public MeasuredMaximumDemand toEngine() {
    return new MeasuredMaximumDemand(
        periodStart, periodEnd, peakOn, maximumDemand, unit == Unit.KVA, intervalMinutes);
  }

  public Long getId() {
    return id;
  }

  public long getSiteId() {
    return siteId;
  }

  public long getBoardId() {
    return boardId;
  }

  public Instant getRecordedAt() {
    return recordedAt;
  }

  public String getUsername() {
    return username;
  }

  public LocalDate getPeriodStart() {
    return periodStart;
  }

  public LocalDate getPeriodEnd() {
    return periodEnd;
  }

  public LocalDate getPeakOn() {
    return peakOn;
  }

  public double getMaximumDemand() {
    return maximumDemand;
  }

  public Unit getUnit() {
    return unit;
  }

  public Integer getIntervalMinutes() {
    return intervalMinutes;
  }

  public String getNote() {
    return note;
  }
}
