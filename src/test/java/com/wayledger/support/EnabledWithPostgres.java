package com.wayledger.support;

import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;
import org.junit.jupiter.api.extension.ConditionEvaluationResult;
import org.junit.jupiter.api.extension.ExecutionCondition;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.extension.ExtensionContext;

/**
 * Runs the annotated test class only when {@link PostgresDatabase} finds a database: otherwise the
 * class is skipped with the reason, except in CI (CI=true), where it fails before Spring even
 * starts.
 */
@Target(ElementType.TYPE)
@Retention(RetentionPolicy.RUNTIME)
@ExtendWith(EnabledWithPostgres.Condition.class)
public @interface EnabledWithPostgres {

  class Condition implements ExecutionCondition {
    @Override
    public ConditionEvaluationResult evaluateExecutionCondition(ExtensionContext context) {
      if (PostgresDatabase.find() != null) {
        return ConditionEvaluationResult.enabled("PostgreSQL at " + PostgresDatabase.find().url());
      }
      if (RealParts.inCi()) {
        throw new AssertionError("CI=true but " + PostgresDatabase.whyMissing());
      }
      return ConditionEvaluationResult.disabled("Skipped: " + PostgresDatabase.whyMissing());
    }
  }
}
