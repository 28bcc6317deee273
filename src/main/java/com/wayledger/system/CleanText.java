package com.wayledger.system;

import jakarta.validation.Constraint;
import jakarta.validation.ConstraintValidator;
import jakarta.validation.ConstraintValidatorContext;
import jakarta.validation.Payload;
import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;

/**
 * A text field that follows {@link TextInput}'s rules; the message names the character at fault.
 * Put on every text component of a form record, so pages, API and import refuse alike.
 */
@Target({
  ElementType.FIELD,
  ElementType.PARAMETER,
  ElementType.RECORD_COMPONENT,
  ElementType.METHOD
})
@Retention(RetentionPolicy.RUNTIME)
@Constraint(validatedBy = CleanText.Check.class)
public @interface CleanText {

  TextInput.Kind value() default TextInput.Kind.LINE;

  String message() default "{text.control}";

  Class<?>[] groups() default {};

  Class<? extends Payload>[] payload() default {};

  /** The validator behind the annotation. */
  class Check implements ConstraintValidator<CleanText, String> {
    private TextInput.Kind kind;

    @Override
    public void initialize(CleanText annotation) {
      kind = annotation.value();
    }

    @Override
    public boolean isValid(String value, ConstraintValidatorContext context) {
      TextInput.Problem problem = TextInput.problem(TextInput.normalise(value), kind);
      if (problem == null) {
        return true;
      }
      context.disableDefaultConstraintViolation();
      String where = problem.character().isEmpty() ? "" : " (" + problem.character() + ")";
      context
          .buildConstraintViolationWithTemplate("{" + problem.messageCode() + "}" + where)
          .addConstraintViolation();
      return false;
    }
  }
}
