package com.wayledger.system;

import jakarta.persistence.EntityManager;
import jakarta.persistence.PersistenceContext;
import java.util.Set;
import java.util.TreeSet;
import org.springframework.context.event.EventListener;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.orm.jpa.EntityManagerFactoryUtils;
import org.springframework.stereotype.Component;
import org.springframework.transaction.support.TransactionSynchronization;
import org.springframework.transaction.support.TransactionSynchronizationManager;

/**
 * The data generation of each site: a counter that every committed change to the site's data moves
 * on by one. Analyses are kept per site and generation (board.AnalysisService), so this is the one
 * place that decides when they go stale — and every change reaches it through the {@link
 * ScheduleChanged} event that the change log needs anyway, so a new kind of change gets it for
 * free.
 *
 * <p>The increment is an {@code UPDATE site SET data_generation = data_generation + 1} in the
 * change's own transaction, issued once per site just before commit, after the change's own rows
 * are flushed: a rolled-back change moves nothing, two concurrent changes both count (the row lock
 * orders them; neither is refused), and every transaction takes the site row last, so two edits of
 * one site cannot deadlock on it. Several app instances share the counter through the database.
 */
@Component
public class SiteGenerations {

  /** Marks "every site" in the pending set (a diversity method changed). */
  private static final long ALL_SITES = -1;

  private static final Object PENDING = new Object();

  private final JdbcClient jdbc;

  @PersistenceContext private EntityManager entityManager;

  SiteGenerations(JdbcClient jdbc) {
    this.jdbc = jdbc;
  }

  /** The site's current generation as committed (or as changed by the caller's transaction). */
  public long current(long siteId) {
    return jdbc.sql("SELECT data_generation FROM site WHERE id = ?")
        .param(siteId)
        .query(Long.class)
        .optional()
        .orElseThrow(() -> new NotFoundException("Site", siteId));
  }

  /** Every site's current generation, by site id, in one query. */
  public java.util.Map<Long, Long> everySite() {
    java.util.Map<Long, Long> generations = new java.util.HashMap<>();
    jdbc.sql("SELECT id, data_generation FROM site")
        .query((rs, n) -> generations.put(rs.getLong(1), rs.getLong(2)))
        .list();
    return generations;
  }

  /** A site and its current generation. */
  public record Stamp(long siteId, long generation) {}

  /**
   * The site of a board and that site's current generation, in one query (empty for an unknown
   * board).
   */
  public java.util.Optional<Stamp> ofBoard(long boardId) {
    return jdbc.sql(
            "SELECT s.id, s.data_generation FROM board b JOIN site s ON s.id = b.site_id"
                + " WHERE b.id = ?")
        .param(boardId)
        .query((row, n) -> new Stamp(row.getLong(1), row.getLong(2)))
        .optional();
  }

  /** Whether the caller's transaction has changed data whose generation is not yet moved on. */
  public static boolean changesPending() {
    return TransactionSynchronizationManager.hasResource(PENDING);
  }

  @EventListener
  void scheduleChanged(ScheduleChanged change) {
    moveOn(change.siteId());
  }

  @EventListener
  void methodsChanged(MethodsChanged change) {
    moveOn(ALL_SITES);
  }

  private void moveOn(long siteId) {
    if (!TransactionSynchronizationManager.isSynchronizationActive()) {
      increment(Set.of(siteId));
      return;
    }
    @SuppressWarnings("unchecked")
    Set<Long> pending = (Set<Long>) TransactionSynchronizationManager.getResource(PENDING);
    if (pending == null) {
      Set<Long> sites = new TreeSet<>();
      pending = sites;
      TransactionSynchronizationManager.bindResource(PENDING, sites);
      TransactionSynchronizationManager.registerSynchronization(
          new TransactionSynchronization() {
            @Override
            public void beforeCommit(boolean readOnly) {
              flushChanges();
              increment(sites);
            }

            @Override
            public void afterCompletion(int status) {
              TransactionSynchronizationManager.unbindResourceIfPossible(PENDING);
            }
          });
    }
    pending.add(siteId);
  }

  /** The change's own rows first, so the site row is the last lock every change takes. */
  private void flushChanges() {
    if (entityManager == null || !TransactionSynchronizationManager.isActualTransactionActive()) {
      return;
    }
    try {
      if (entityManager.isJoinedToTransaction()) {
        entityManager.flush();
      }
    } catch (RuntimeException failure) {
      // A stale version must surface as the usual optimistic-locking conflict, not as an error.
      RuntimeException translated =
          EntityManagerFactoryUtils.convertJpaAccessExceptionIfPossible(failure);
      throw translated != null ? translated : failure;
    }
  }

  private void increment(Set<Long> siteIds) {
    if (siteIds.contains(ALL_SITES)) {
      jdbc.sql("UPDATE site SET data_generation = data_generation + 1").update();
      return;
    }
    for (long siteId : siteIds) { // ascending: two multi-site changes lock rows in one order
      jdbc.sql("UPDATE site SET data_generation = data_generation + 1 WHERE id = ?")
          .param(siteId)
          .update();
    }
  }
}
