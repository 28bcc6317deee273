package com.wayledger.system;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.beans.PropertyEditorSupport;
import java.lang.reflect.RecordComponent;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.springframework.beans.factory.config.BeanDefinition;
import org.springframework.context.annotation.ClassPathScanningCandidateComponentProvider;
import org.springframework.context.annotation.Configuration;
import org.springframework.core.type.filter.AssignableTypeFilter;
import org.springframework.util.ClassUtils;
import org.springframework.web.bind.WebDataBinder;
import org.springframework.web.bind.annotation.ControllerAdvice;
import org.springframework.web.bind.annotation.InitBinder;
import org.springframework.web.multipart.MultipartFile;
import org.springframework.web.multipart.MultipartHttpServletRequest;
import org.springframework.web.servlet.HandlerInterceptor;
import org.springframework.web.servlet.config.annotation.InterceptorRegistry;
import org.springframework.web.servlet.config.annotation.WebMvcConfigurer;
import org.springframework.web.util.WebUtils;

/**
 * Where {@link TextInput}'s rules meet the request, before any handler runs:
 *
 * <ul>
 *   <li>every request parameter and uploaded file name is checked with the loosest rule
 *       (multi-line): no NUL or other control character except tab and line breaks, no
 *       text-direction controls, no broken characters. A refusal is a 400 naming the parameter. The
 *       text fields of the form records (components marked {@link CleanText}) are left to their own
 *       stricter check, so their message appears beside the field instead;
 *   <li>parameter names with brackets ({@code name[0]}) are refused unless they have the one shape
 *       a list-binding form uses ({@code rows[3].circuitId}, index below 1000): binding other
 *       indexed names to a record fails inside the framework (and a malformed path that gets
 *       through is a 400 from {@link PageErrorHandling});
 *   <li>every text value bound to a form or a parameter is normalised ({@link
 *       TextInput#normalise}).
 * </ul>
 */
@Configuration
public class RequestTextGuard implements WebMvcConfigurer {

  private final Set<String> formTextFields = formTextFields();

  @Override
  public void addInterceptors(InterceptorRegistry registry) {
    registry.addInterceptor(new Check(formTextFields));
  }

  /** Names of the form-record components marked {@link CleanText}. */
  private static Set<String> formTextFields() {
    Set<String> names = new HashSet<>();
    ClassPathScanningCandidateComponentProvider scanner =
        new ClassPathScanningCandidateComponentProvider(false) {
          @Override
          protected boolean isCandidateComponent(
              org.springframework.beans.factory.annotation.AnnotatedBeanDefinition definition) {
            return definition.getMetadata().isIndependent();
          }
        };
    scanner.addIncludeFilter(new AssignableTypeFilter(Record.class));
    for (BeanDefinition definition : scanner.findCandidateComponents("com.wayledger")) {
      Class<?> type =
          ClassUtils.resolveClassName(
              definition.getBeanClassName(), RequestTextGuard.class.getClassLoader());
      for (RecordComponent component : type.getRecordComponents()) {
        if (component.isAnnotationPresent(CleanText.class)) {
          names.add(component.getName());
        }
      }
    }
    return Set.copyOf(names);
  }

  /** The one indexed form a list-binding form uses: {@code rows[12].circuitId}. */
  static final java.util.regex.Pattern LIST_FIELD =
      java.util.regex.Pattern.compile("[A-Za-z][A-Za-z0-9]*\\[[0-9]{1,3}]\\.[A-Za-z][A-Za-z0-9]*");

  static final class Check implements HandlerInterceptor {
    private final Set<String> formTextFields;

    Check(Set<String> formTextFields) {
      this.formTextFields = formTextFields;
    }

    @Override
    public boolean preHandle(
        HttpServletRequest request, HttpServletResponse response, Object handler) {
      if (request.getDispatcherType() == jakarta.servlet.DispatcherType.ERROR) {
        return true; // the error page of a request already refused or failed: let it show
      }
      for (Map.Entry<String, String[]> parameter : request.getParameterMap().entrySet()) {
        String name = parameter.getKey();
        check("(a field name)", name);
        if ((name.indexOf('[') >= 0 || name.indexOf(']') >= 0)
            && !LIST_FIELD.matcher(name).matches()) {
          throw new TextRefused(safe(name), "text.indexedName", "");
        }
        if (formTextFields.contains(name)) {
          continue;
        }
        for (String value : parameter.getValue()) {
          check(name, value);
        }
      }
      MultipartHttpServletRequest multipart =
          WebUtils.getNativeRequest(request, MultipartHttpServletRequest.class);
      if (multipart != null) {
        for (Map.Entry<String, List<MultipartFile>> part : multipart.getMultiFileMap().entrySet()) {
          check("(a field name)", part.getKey());
          for (MultipartFile file : part.getValue()) {
            check(part.getKey() + " (file name)", file.getOriginalFilename());
          }
        }
      }
      return true;
    }

    private static void check(String field, String value) {
      TextInput.Problem problem =
          TextInput.problem(TextInput.normalise(value), TextInput.Kind.MULTI_LINE);
      if (problem != null) {
        throw new TextRefused(safe(field), problem.messageCode(), problem.character());
      }
    }

    /** A parameter name fit to show back: printable, short. */
    private static String safe(String name) {
      StringBuilder out = new StringBuilder();
      name.codePoints()
          .limit(60)
          .forEach(
              cp ->
                  out.append(TextInput.isVisible(cp) || cp == ' ' ? Character.toString(cp) : "?"));
      return out.toString();
    }
  }

  /** Normalises every text value bound from a page request (form fields and parameters). */
  @ControllerAdvice
  public static class Normalising {
    @InitBinder
    public void normalise(WebDataBinder binder) {

      binder.registerCustomEditor(
          String.class,
          new PropertyEditorSupport() {
            @Override
            public void setAsText(String text) {
              setValue(TextInput.normalise(text));
            }
          });
    }
  }
}
