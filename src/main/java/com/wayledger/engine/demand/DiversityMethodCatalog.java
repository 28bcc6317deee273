package com.wayledger.engine.demand;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The methods a site can choose from, by key: the built-in ones plus any user methods.
 *
 * @param methods methods in display order; a later method replaces an earlier one of the same key
 */
public record DiversityMethodCatalog(List<DiversityMethod> methods) {

  public DiversityMethodCatalog {
    Map<String, DiversityMethod> byKey = new LinkedHashMap<>();
    for (DiversityMethod method : methods) {
      byKey.put(method.key(), method);
    }
    methods = List.copyOf(byKey.values());
  }

  /** The method with this key, if any. */
  public Optional<DiversityMethod> find(String key) {
    if (key == null) {
      return Optional.empty();
    }
    for (DiversityMethod method : methods) {
      if (method.key().equals(key)) {
        return Optional.of(method);
      }
    }
    return Optional.empty();
  }

  /** This catalog with a user method added, or replacing the method of the same key. */
  public DiversityMethodCatalog with(DiversityMethod method) {
    List<DiversityMethod> all = new ArrayList<>(methods);
    all.add(method);
    return new DiversityMethodCatalog(all);
  }

  /**
   * The method a board uses: its own key, else the site's default key, else the fallback key, else
   * no diversity. A key that names no method is passed over, and so is a method with problems.
   */
  public DiversityMethod resolve(String boardKey, String siteKey, String fallbackKey) {
    for (String key : new String[] {boardKey, siteKey, fallbackKey}) {
      Optional<DiversityMethod> method = find(key);
      if (method.isPresent() && method.get().problems().isEmpty()) {
        return method.get();
      }
    }
    return DiversityMethods.none();
  }
}
