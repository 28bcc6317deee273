package com.wayledger.system;

import jakarta.servlet.http.HttpServletRequest;
import java.lang.reflect.Constructor;
import java.lang.reflect.RecordComponent;
import org.springframework.core.convert.ConversionService;
import org.springframework.core.convert.support.DefaultConversionService;
import org.springframework.ui.Model;
import org.springframework.validation.BeanPropertyBindingResult;
import org.springframework.validation.BindingResult;

/**
 * Form records are bound through their constructor; when one submitted value cannot be converted
 * (letters in a number field) Spring cannot construct the record at all and the form would come
 * back empty. This rebuilds the record from the request with each unconvertible value left blank,
 * and carries the binding errors over, so the user sees every value they typed and the message
 * beside the field at fault.
 */
public final class FormRecovery {

  private FormRecovery() {}

  /**
   * Returns {@code form} when binding kept it; otherwise (binding errors left the binding result
   * without a target) a recovered record, registered in the model under {@code name} with the
   * original errors.
   */
  public static <R extends Record> R ensure(
      R form,
      BindingResult errors,
      Model model,
      String name,
      Class<R> type,
      HttpServletRequest request) {
    if (errors.getTarget() != null) {
      return form;
    }
    R recovered =
        form != null ? form : rebuild(type, request, DefaultConversionService.getSharedInstance());
    BeanPropertyBindingResult carried = new BeanPropertyBindingResult(recovered, name);
    carried.addAllErrors(errors);
    model.addAttribute(name, recovered);
    model.addAttribute(BindingResult.MODEL_KEY_PREFIX + name, carried);
    return recovered;
  }

  private static <R extends Record> R rebuild(
      Class<R> type, HttpServletRequest request, ConversionService conversion) {
    RecordComponent[] components = type.getRecordComponents();
    Object[] values = new Object[components.length];
    Class<?>[] types = new Class<?>[components.length];
    for (int i = 0; i < components.length; i++) {
      types[i] = components[i].getType();
      values[i] = convert(request.getParameter(components[i].getName()), types[i], conversion);
    }
    try {
      Constructor<R> constructor = type.getDeclaredConstructor(types);
      return constructor.newInstance(values);
    } catch (ReflectiveOperationException e) {
      throw new IllegalStateException("Cannot rebuild form " + type.getSimpleName(), e);
    }
  }

  private static Object convert(String raw, Class<?> target, ConversionService conversion) {
    if (target == boolean.class) {
      return raw != null && (raw.equals("true") || raw.equals("on"));
    }
    if (raw == null || raw.isBlank()) {
      return target.isPrimitive() ? defaultOf(target) : null;
    }
    try {
      return conversion.convert(raw.strip(), target);
    } catch (RuntimeException unconvertible) {
      return target.isPrimitive() ? defaultOf(target) : null;
    }
  }

  private static Object defaultOf(Class<?> primitive) {
    if (primitive == int.class) {
      return 0;
    }
    if (primitive == long.class) {
      return 0L;
    }
    if (primitive == double.class) {
      return 0.0;
    }
    return null;
  }
}
