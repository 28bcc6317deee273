package com.wayledger.loadlog;

import com.wayledger.site.SiteService;
import com.wayledger.system.ChangeKind;
import com.wayledger.system.NotFoundException;
import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import java.time.LocalDate;
import java.util.List;
import org.springframework.format.annotation.DateTimeFormat;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;

/**
 * The change log over JSON, read-only: there is no PUT, PATCH or DELETE here by design, so those
 * methods get 405 on these URLs.
 */
@RestController
@RequestMapping("/api")
@Tag(name = "Change log", description = "Append-only record of every schedule change (read-only)")
public class ChangeLogApiController {

  private final ChangeLog log;
  private final SiteService sites;

  public ChangeLogApiController(ChangeLog log, SiteService sites) {
    this.log = log;
    this.sites = sites;
  }

  @GetMapping("/sites/{siteId}/log")
  @Operation(summary = "A site's change log, newest first, optionally filtered")
  public List<ChangeLogEntry> siteLog(
      @PathVariable long siteId,
      @RequestParam(required = false) Long boardId,
      @RequestParam(required = false) String username,
      @RequestParam(required = false) @DateTimeFormat(iso = DateTimeFormat.ISO.DATE) LocalDate from,
      @RequestParam(required = false) @DateTimeFormat(iso = DateTimeFormat.ISO.DATE) LocalDate to,
      @RequestParam(required = false) ChangeKind kind) {
    sites.get(siteId);
    return log.ofSite(siteId, new LogFilter(boardId, username, from, to, kind));
  }

  @GetMapping("/sites/{siteId}/log/verify")
  @Operation(
      summary =
          "Check a site's change-log hash chain: intact, or the first entry where it breaks and why")
  public LogVerification verify(@PathVariable long siteId) {
    sites.get(siteId);
    return log.verify(siteId);
  }

  @GetMapping("/log/{entryId}")
  @Operation(summary = "One change-log entry")
  public ChangeLogEntry entry(@PathVariable long entryId) {
    return log.find(entryId).orElseThrow(() -> new NotFoundException("Log entry", entryId));
  }
}
