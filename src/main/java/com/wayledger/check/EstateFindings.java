package com.wayledger.check;

import com.wayledger.board.AnalysisService;
import com.wayledger.board.SiteAnalysis;
import com.wayledger.engine.protection.BoardFindings;
import com.wayledger.engine.protection.CircuitFindings;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import com.wayledger.system.SiteGenerations;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.springframework.stereotype.Service;

/**
 * The findings of every site in one list, filtered by grade and by site name, a page at a time.
 * Each site's findings come from its analysis ({@link AnalysisService#ofSite}, computed once per
 * change of that site), and the lines made from it are kept here with the site's data generation:
 * the analysis service keeps only the most recently read sites, and an estate of hundreds of sites
 * would otherwise push every site out and recompute it on every view. Reading this list again after
 * no change runs no engine; a change to one site recomputes that site only. The lines kept are the
 * problems and the not-assessed checks (never the passes), a few hundred bytes each.
 */
@Service
public class EstateFindings {

  /** Findings on one page. */
  public static final int PAGE_SIZE = 50;

  /** The grades the list can be filtered by, worst first. */
  public static final List<Verdict> GRADES =
      List.of(Verdict.DANGER, Verdict.WARNING, Verdict.ADVICE, Verdict.NOT_ASSESSED);

  private final SiteService sites;
  private final AnalysisService analysis;
  private final SiteGenerations generations;

  /** Each site's lines (every grade but pass) with the data generation they were made at. */
  private record Kept(long generation, List<Line> lines) {}

  private final Map<Long, Kept> kept = new ConcurrentHashMap<>();

  public EstateFindings(SiteService sites, AnalysisService analysis, SiteGenerations generations) {
    this.sites = sites;
    this.analysis = analysis;
    this.generations = generations;
  }

  /**
   * One finding, where it is and what it says.
   *
   * @param boardId the board, or null for a finding about the site's origin (its supply fuse)
   * @param circuitId the circuit, or null for a finding about the board itself
   * @param wayNumber the circuit's way, or null for a board finding
   * @param line "L2", "L1–L3", or "" when not recorded or a board finding
   * @param circuit what the circuit feeds, or ""
   */
  public record Line(
      long siteId,
      String siteName,
      Long boardId,
      String boardReference,
      Long circuitId,
      Integer wayNumber,
      String line,
      String circuit,
      Verdict grade,
      String check,
      String summary,
      String reference,
      String remedy) {}

  /**
   * One page of the list.
   *
   * @param number the page, from 0
   * @param total findings that match the filter across all pages
   * @param sitesRead how many sites matched the site filter
   */
  public record Page(List<Line> lines, int number, int size, long total, int sitesRead) {

    public int pages() {
      return (int) Math.max(1, (total + size - 1) / size);
    }

    public boolean hasPrevious() {
      return number > 0;
    }

    public boolean hasNext() {
      return number + 1 < pages();
    }

    /** The 1-based position of the first line shown. */
    public long first() {
      return lines.isEmpty() ? 0 : (long) number * size + 1;
    }

    public long last() {
      return (long) number * size + lines.size();
    }
  }

  /**
   * A page of the findings of the grade asked for (every problem — danger, warning, advice — when
   * none), on sites whose name contains {@code siteText} (ignoring case; all sites when blank),
   * worst first, then by site, board and way.
   */
  public Page page(Verdict grade, String siteText, int page, int size) {
    int pageSize = Math.max(1, Math.min(size, 200));
    String wanted = siteText == null ? "" : siteText.strip().toLowerCase(Locale.ROOT);
    // Generations are read before any analysis, so a line kept is never older than its generation.
    Map<Long, Long> current = generations.everySite();
    kept.keySet().retainAll(current.keySet());
    List<Line> all = new ArrayList<>();
    int sitesRead = 0;
    for (Site site : sites.all()) {
      if (!wanted.isEmpty() && !site.getName().toLowerCase(Locale.ROOT).contains(wanted)) {
        continue;
      }
      sitesRead++;
      for (Line line : linesOf(site, current.get(site.getId()))) {
        if (shown(line.grade(), grade)) {
          all.add(line);
        }
      }
    }
    all.sort(
        Comparator.comparing(Line::grade)
            .thenComparing(Line::siteName, String.CASE_INSENSITIVE_ORDER)
            .thenComparing(Line::siteId)
            .thenComparing(Line::boardReference, String.CASE_INSENSITIVE_ORDER)
            .thenComparing(l -> l.boardId() == null ? -1L : l.boardId())
            .thenComparing(l -> l.wayNumber() == null ? -1 : l.wayNumber())
            .thenComparing(Line::line));
    int number = Math.max(0, page);
    int from = (int) Math.min((long) number * pageSize, all.size());
    int to = Math.min(from + pageSize, all.size());
    return new Page(List.copyOf(all.subList(from, to)), number, pageSize, all.size(), sitesRead);
  }

  /** The site's lines at its current generation: kept, or made once from its analysis. */
  private List<Line> linesOf(Site site, Long generation) {
    Kept k = kept.get(site.getId());
    if (k != null && generation != null && k.generation() == generation) {
      return k.lines();
    }
    List<Line> lines = new ArrayList<>();
    collect(site, analysis.ofSite(site.getId()), lines);
    if (generation != null) {
      kept.put(site.getId(), new Kept(generation, List.copyOf(lines)));
    }
    return lines;
  }

  private static void collect(Site site, SiteAnalysis results, List<Line> out) {
    for (Finding f : results.findings().siteFindings()) {
      if (f.verdict() != Verdict.PASS) {
        out.add(
            new Line(
                site.getId(),
                site.getName(),
                null,
                "",
                null,
                null,
                "",
                "",
                f.verdict(),
                f.check().name(),
                f.summary(),
                f.reference(),
                f.remedy()));
      }
    }
    for (BoardFindings board : results.findings().boards()) {
      for (Finding f : board.findings()) {
        if (f.verdict() != Verdict.PASS) {
          out.add(line(site, board, null, f));
        }
      }
      for (CircuitFindings circuit : board.circuits()) {
        for (Finding f : circuit.findings()) {
          if (f.verdict() != Verdict.PASS) {
            out.add(line(site, board, circuit, f));
          }
        }
      }
    }
  }

  private static Line line(Site site, BoardFindings board, CircuitFindings circuit, Finding f) {
    return new Line(
        site.getId(),
        site.getName(),
        board.boardId(),
        board.reference(),
        circuit == null ? null : circuit.circuitId(),
        circuit == null ? null : circuit.wayNumber(),
        circuit == null ? "" : circuit.lineLabel(),
        circuit == null || circuit.description() == null ? "" : circuit.description(),
        f.verdict(),
        f.check().name(),
        f.summary(),
        f.reference(),
        f.remedy());
  }

  private static boolean shown(Verdict verdict, Verdict grade) {
    return grade == null ? verdict.isProblem() : verdict == grade;
  }
}
