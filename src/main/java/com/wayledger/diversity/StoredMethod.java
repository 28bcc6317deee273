package com.wayledger.diversity;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.time.Instant;

/** A user-defined diversity method, stored as the engine's method in JSON. */
@Entity
@Table(name = "diversity_method")
class StoredMethod {

  @Id
  @Column(name = "method_key")
  private String key;

  private String name;
  private String basedOn;
  private String definition;
  private String updatedBy;
  private Instant updatedAt;

  @Version private long version;

  protected StoredMethod() {}

  StoredMethod(String key, String name, String basedOn, String definition, String updatedBy) {
    this.key = key;
    this.basedOn = basedOn;
    update(name, definition, updatedBy);
  }

  void update(String newName, String newDefinition, String by) {
    name = newName;
    definition = newDefinition;
    updatedBy = by;
    updatedAt = Instant.now();
  }

  String getKey() {
    return key;
  }

  String getName() {
    return name;
  }

  String getBasedOn() {
    return basedOn;
  }

  String getDefinition() {
    return definition;
  }

  long getVersion() {
    return version;
  }
}
