package com.wayledger.board;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.function.Supplier;

/**
 * The latest analysis of the most recently read sites, each with the data generation it was
 * computed at (system.SiteGenerations). A read at the same generation takes the kept result; the
 * first read at a newer generation computes it once while concurrent readers of that generation
 * wait for the same result; a reader that still sees an older generation computes for itself and
 * keeps nothing. At most {@code capacity} sites are kept, least recently read dropped first.
 */
final class AnalysisCache {

  private record Kept(long generation, CompletableFuture<SiteAnalysis> result) {}

  private final int capacity;
  private final Map<Long, Kept> bySite;

  AnalysisCache(int capacity) {
    this.capacity = Math.max(0, capacity);
    this.bySite =
        new LinkedHashMap<>(16, 0.75f, true) {
          @Override
          protected boolean removeEldestEntry(Map.Entry<Long, Kept> eldest) {
            return size() > AnalysisCache.this.capacity;
          }
        };
  }

  SiteAnalysis get(long siteId, long generation, Supplier<SiteAnalysis> compute) {
    Kept kept;
    boolean computeHere = false;
    synchronized (bySite) {
      kept = bySite.get(siteId);
      if (kept == null || kept.generation() < generation) {
        if (capacity == 0) {
          return compute.get();
        }
        kept = new Kept(generation, new CompletableFuture<>());
        bySite.put(siteId, kept);
        computeHere = true;
      } else if (kept.generation() > generation) {
        kept = null; // this reader's view is older than what is kept: do not replace it
      }
    }
    if (kept == null) {
      return compute.get();
    }
    if (computeHere) {
      try {
        kept.result().complete(compute.get());
      } catch (RuntimeException | Error failure) {
        kept.result().completeExceptionally(failure);
        synchronized (bySite) {
          bySite.remove(siteId, kept);
        }
        throw failure;
      }
    }
    try {
      return kept.result().join();
    } catch (CompletionException failed) {
      if (failed.getCause() instanceof RuntimeException runtime) {
        throw runtime;
      }
      throw failed;
    }
  }

  /** Drops everything kept (tests, and an operator who changed data behind the application). */
  void clear() {
    synchronized (bySite) {
      bySite.clear();
    }
  }
}
