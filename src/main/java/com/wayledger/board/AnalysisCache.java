package com.wayledger.board;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.function.Function;
import java.util.function.Supplier;

/**
 * The latest analysis of the most recently read sites, each with the data generation it was
 * computed at (system.SiteGenerations). A read at the same generation takes the kept result; the
 * first read at a newer generation computes it once while concurrent readers of that generation
 * wait for the same result; a reader that still sees an older generation computes for itself and
 * keeps nothing. At most {@code capacity} sites are kept, least recently read dropped first.
 *
 * <p>Beside each site's analysis are the page views built from it and the site's data at the same
 * generation ({@link #view}): at most {@code viewsPerSite} of them per site, least recently read
 * dropped first, and all of them dropped with the analysis when the generation moves on.
 */
final class AnalysisCache {

  private record Kept(
      long generation,
      CompletableFuture<SiteAnalysis> result,
      Map<Object, CompletableFuture<Object>> views) {}

  private final int capacity;
  private final int viewsPerSite;
  private final Map<Long, Kept> bySite;

  AnalysisCache(int capacity) {
    this(capacity, 0);
  }

  AnalysisCache(int capacity, int viewsPerSite) {
    this.capacity = Math.max(0, capacity);
    this.viewsPerSite = Math.max(0, viewsPerSite);
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
        kept = new Kept(generation, new CompletableFuture<>(), viewMap());
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
    return joined(kept.result());
  }

  /**
   * A view of a site at a data generation, built from the site's analysis at that generation: a
   * read at the same generation and key takes the kept view, the first computes it once while
   * concurrent readers of the same key wait for it. A reader at an older generation than the kept
   * one, or a site no longer kept, builds for itself and keeps nothing.
   *
   * @param analysis computes the site's analysis when it is not kept (see {@link #get})
   * @param build builds the view from the analysis; reads the site's data itself
   */
  @SuppressWarnings("unchecked")
  <V> V view(
      long siteId,
      long generation,
      Object key,
      Supplier<SiteAnalysis> analysis,
      Function<SiteAnalysis, V> build) {
    SiteAnalysis results = get(siteId, generation, analysis);
    CompletableFuture<Object> view;
    boolean buildHere = false;
    Kept kept;
    synchronized (bySite) {
      kept = bySite.get(siteId);
      if (kept == null || kept.generation() != generation || viewsPerSite == 0) {
        view = null;
      } else {
        view = kept.views().get(key);
        if (view == null) {
          view = new CompletableFuture<>();
          kept.views().put(key, view);
          buildHere = true;
        }
      }
    }
    if (view == null) {
      return build.apply(results);
    }
    if (buildHere) {
      try {
        view.complete(build.apply(results));
      } catch (RuntimeException | Error failure) {
        view.completeExceptionally(failure);
        synchronized (bySite) {
          kept.views().remove(key, view);
        }
        throw failure;
      }
    }
    return (V) joined(view);
  }

  private Map<Object, CompletableFuture<Object>> viewMap() {
    return new LinkedHashMap<>(16, 0.75f, true) {
      @Override
      protected boolean removeEldestEntry(Map.Entry<Object, CompletableFuture<Object>> eldest) {
        return size() > viewsPerSite;
      }
    };
  }

  private static <T> T joined(CompletableFuture<T> result) {
    try {
      return result.join();
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
