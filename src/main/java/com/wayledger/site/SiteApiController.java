package com.wayledger.site;

import com.wayledger.engine.EarthingSystem;
import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import java.util.List;
import org.springframework.http.HttpStatus;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.PutMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.ResponseStatus;
import org.springframework.web.bind.annotation.RestController;

/** Sites over JSON: the same operations and rules as the pages. */
@RestController
@RequestMapping("/api/sites")
@Tag(name = "Sites", description = "Installations and their supply")
public class SiteApiController {

  private final SiteService sites;

  public SiteApiController(SiteService sites) {
    this.sites = sites;
  }

  /** A site as the API shows it. Units in names. */
  public record SiteView(
      long id,
      String name,
      String address,
      EarthingSystem earthingSystem,
      double nominalVoltageVolts,
      int phases,
      double frequencyHertz,
      Double externalLoopImpedanceOhms,
      Double prospectiveFaultCurrentKiloAmps,
      Double supplyFuseRatingAmps,
      String defaultDiversityMethod,
      String notes,
      long version,
      String ruleSet,
      com.wayledger.engine.SupplySystem supplySystem) {

    static SiteView of(Site site) {
      return new SiteView(
          site.getId(),
          site.getName(),
          site.getAddress(),
          site.getEarthingSystem(),
          site.getNominalVoltageVolts(),
          site.getPhases(),
          site.getFrequencyHertz(),
          site.getExternalLoopImpedanceOhms(),
          site.getProspectiveFaultCurrentKiloAmps(),
          site.getSupplyFuseRatingAmps(),
          site.getDefaultDiversityMethod(),
          site.getNotes(),
          site.getVersion(),
          site.getRuleSet(),
          site.getSupplySystem());
    }
  }

  @GetMapping
  @Operation(summary = "List all sites")
  public List<SiteView> list() {
    return sites.all().stream().map(SiteView::of).toList();
  }

  @GetMapping("/{id}")
  @Operation(summary = "One site")
  public SiteView get(@PathVariable long id) {
    return SiteView.of(sites.get(id));
  }

  @PostMapping
  @ResponseStatus(HttpStatus.CREATED)
  @Operation(summary = "Create a site (editor)")
  public SiteView create(@Valid @RequestBody SiteForm form) {
    return SiteView.of(sites.create(form));
  }

  @PutMapping("/{id}")
  @Operation(
      summary =
          "Replace a site's fields (editor); send the version you read to detect concurrent edits")
  public SiteView update(@PathVariable long id, @Valid @RequestBody SiteForm form) {
    return SiteView.of(sites.update(id, form));
  }
}
