package com.wayledger.diversity;

import com.wayledger.engine.demand.CategoryGroup;
import com.wayledger.engine.demand.DiversityMethod;
import com.wayledger.engine.demand.DiversityMethodCatalog;
import com.wayledger.engine.demand.DiversityMethods;
import com.wayledger.system.MethodsChanged;
import com.wayledger.system.NotFoundException;
import com.wayledger.system.RowLocks;
import com.wayledger.system.RuleViolation;
import com.wayledger.system.StaleEditException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.context.ApplicationEventPublisher;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * The diversity methods a board may use: the engine's built-in ones and the user-defined copies.
 */
@Service
public class MethodLibrary {

  private static final Logger LOG = LoggerFactory.getLogger(MethodLibrary.class);
  private static final String KEY_PATTERN = "[a-z0-9][a-z0-9-]{1,59}";

  private final StoredMethodRepository stored;
  private final ApplicationEventPublisher events;
  private final RowLocks locks;

  public MethodLibrary(
      StoredMethodRepository stored, ApplicationEventPublisher events, RowLocks locks) {
    this.locks = locks;
    this.stored = stored;
    this.events = events;
  }

  /**
   * A method as listed: the method, whether it is built in, what it was copied from, its version.
   */
  public record Entry(DiversityMethod method, boolean builtIn, String basedOn, long version) {}

  /** Every method a board can choose, built-in first. */
  @Transactional(readOnly = true)
  public DiversityMethodCatalog catalog() {
    DiversityMethodCatalog catalog = DiversityMethods.builtIn();
    for (Entry entry : userEntries()) {
      catalog = catalog.with(entry.method());
    }
    return catalog;
  }

  @Transactional(readOnly = true)
  public List<Entry> entries() {
    List<Entry> entries = new ArrayList<>();
    DiversityMethods.builtIn()
        .methods()
        .forEach(method -> entries.add(new Entry(method, true, null, 0)));
    entries.addAll(userEntries());
    return entries;
  }

  @Transactional(readOnly = true)
  public Entry entry(String key) {
    return entries().stream()
        .filter(entry -> entry.method().key().equals(key))
        .findFirst()
        .orElseThrow(() -> new NotFoundException("Diversity method", key));
  }

  /** Copies any method under a new key and name; the copy can then be edited. */
  @Transactional
  public DiversityMethod copy(String fromKey, String newKey, String newName, String user) {
    DiversityMethod source = entry(fromKey).method();
    String key = newKey == null ? "" : newKey.strip();
    if (!key.matches(KEY_PATTERN)) {
      throw new RuleViolation("key", "method.key.pattern");
    }
    if (entries().stream().anyMatch(entry -> entry.method().key().equals(key))) {
      throw new RuleViolation("key", "method.key.taken");
    }
    if (newName == null || newName.isBlank() || newName.strip().length() > 120) {
      throw new RuleViolation("name", "method.name.required");
    }
    DiversityMethod copy = source.copyAs(key, newName.strip());
    stored.save(new StoredMethod(key, copy.name(), fromKey, MethodJson.write(copy), user));
    return copy;
  }

  /**
   * Saves edited rule parameters of a user-defined method. Returns the problems by form field
   * (empty when it was saved); nothing is stored while any remains.
   */
  @Transactional
  public Map<String, String> update(
      String key, long version, String name, Map<String, String> submitted, String user) {
    // Exclusive before reading: a second save from the same version waits, then sees the first
    // one's version and becomes a conflict instead of an overwrite.
    if (!locks.exclusive("diversity_method", key)) {
      if (DiversityMethods.builtIn().find(key).isPresent()) {
        throw new RuleViolation("key", "method.builtIn.readOnly");
      }
      throw new NotFoundException("Diversity method", key);
    }
    StoredMethod row =
        stored.findById(key).orElseThrow(() -> new NotFoundException("Diversity method", key));
    if (row.getVersion() != version) {
      throw new StaleEditException("Diversity method " + key);
    }
    Map<String, String> problems = new LinkedHashMap<>();
    DiversityMethod method = MethodJson.read(row.getDefinition());
    DiversityMethod edited = edit(method, submitted, problems);
    if (name == null || name.isBlank() || name.strip().length() > 120) {
      problems.put("name", "Give the method a name of at most 120 characters.");
    }
    List<CategoryGroup> groups = edited.groups();
    for (int i = 0; i < groups.size(); i++) {
      for (String problem : groups.get(i).problems()) {
        problems.merge(prefix(i) + "rule", problem, (a, b) -> a + "; " + b);
      }
    }
    if (problems.isEmpty()) {
      DiversityMethod renamed =
          new DiversityMethod(
              key,
              name.strip(),
              edited.source(),
              edited.groups(),
              edited.needsDwellingParameters());
      row.update(renamed.name(), MethodJson.write(renamed), user);
      // Any site's boards may use the method: their stored analyses are now stale.
      events.publishEvent(new MethodsChanged(key));
    }
    return problems;
  }

  /**
   * The method with each group's rule rebuilt from the submitted values ("g0.factor", "g1.tiers",
   * …).
   */
  static DiversityMethod edit(
      DiversityMethod method, Map<String, String> submitted, Map<String, String> problems) {
    DiversityMethod edited = method;
    List<CategoryGroup> groups = method.groups();
    for (int i = 0; i < groups.size(); i++) {
      CategoryGroup group = groups.get(i);
      edited =
          edited.withGroup(
              group.withRule(RuleParameters.rebuild(group.rule(), prefix(i), submitted, problems)));
    }
    return edited;
  }

  static String prefix(int groupIndex) {
    return "g" + groupIndex + ".";
  }

  private List<Entry> userEntries() {
    List<Entry> entries = new ArrayList<>();
    for (StoredMethod row : stored.findAll()) {
      try {
        entries.add(
            new Entry(
                MethodJson.read(row.getDefinition()), false, row.getBasedOn(), row.getVersion()));
      } catch (RuntimeException unreadable) {
        LOG.error(
            "Stored diversity method '{}' cannot be read and is left out",
            row.getKey(),
            unreadable);
      }
    }
    return entries;
  }
}
