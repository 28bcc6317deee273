package com.wayledger.engine.demand;

import com.wayledger.engine.LoadCategory;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * A diversity method as data: groups of load categories, each with a rule. A category in no group
 * is taken at 100 %. A user's method is a copy of any other with edits ({@link #copyAs}, {@link
 * #withGroup}).
 *
 * @param key stable identifier stored with a board, e.g. "uk-household"
 * @param name name shown to users
 * @param source where the figures come from, for the calculation notes
 * @param groups the method's lines; a category may appear in one group only
 * @param needsDwellingParameters whether the method reads {@link DwellingParameters}
 */
public record DiversityMethod(
    String key,
    String name,
    String source,
    List<CategoryGroup> groups,
    boolean needsDwellingParameters) {

  public DiversityMethod {
    groups = List.copyOf(groups);
  }

  /** A copy under a new key and name, for a user to edit. */
  public DiversityMethod copyAs(String newKey, String newName) {
    return new DiversityMethod(
        newKey, newName, "copy of " + key + ": " + source, groups, needsDwellingParameters);
  }

  /**
   * This method with the group of the same label replaced, or added when no group has that label.
   */
  public DiversityMethod withGroup(CategoryGroup group) {
    List<CategoryGroup> edited = new ArrayList<>(groups);
    boolean replaced = false;
    for (int i = 0; i < edited.size(); i++) {
      if (edited.get(i).label().equals(group.label())) {
        edited.set(i, group);
        replaced = true;
      }
    }
    if (!replaced) {
      edited.add(group);
    }
    boolean dwelling = edited.stream().anyMatch(g -> g.dwellingBasis() != null);
    return new DiversityMethod(key, name, source, edited, dwelling);
  }

  /** The group that holds a category, or null when the category is taken at 100 %. */
  public CategoryGroup groupOf(LoadCategory category) {
    for (CategoryGroup group : groups) {
      if (group.categories().contains(category)) {
        return group;
      }
    }
    return null;
  }

  /** What is wrong with this method; empty when it can be used. */
  public List<String> problems() {
    List<String> problems = new ArrayList<>();
    if (key == null || key.isBlank()) {
      problems.add("key: give the method a key");
    }
    if (name == null || name.isBlank()) {
      problems.add("name: give the method a name");
    }
    Map<LoadCategory, String> seen = new EnumMap<>(LoadCategory.class);
    for (CategoryGroup group : groups) {
      problems.addAll(group.problems());
      for (LoadCategory category : group.categories()) {
        String earlier = seen.put(category, group.label());
        if (earlier != null) {
          problems.add(category + " is in both \"" + earlier + "\" and \"" + group.label() + "\"");
        }
      }
    }
    return problems;
  }
}
