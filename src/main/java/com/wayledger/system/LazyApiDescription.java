package com.wayledger.system;

import org.springframework.beans.factory.config.BeanDefinition;
import org.springframework.beans.factory.config.BeanFactoryPostProcessor;
import org.springframework.beans.factory.config.ConfigurableListableBeanFactory;
import org.springframework.stereotype.Component;

/**
 * The OpenAPI description ({@code /api/openapi}, {@code /api/docs}) is rarely asked for, so its
 * beans (springdoc's) are made lazy: they, and the swagger-core and Jackson 2 classes they bring,
 * are created on the first request for the description instead of at every start. A bean another
 * bean needs at start is still created then; laziness only drops the ones nothing asks for.
 */
@Component
class LazyApiDescription implements BeanFactoryPostProcessor {

  static final String SPRINGDOC = "org.springdoc.";

  @Override
  public void postProcessBeanFactory(ConfigurableListableBeanFactory beanFactory) {
    for (String name : beanFactory.getBeanDefinitionNames()) {
      BeanDefinition definition = beanFactory.getBeanDefinition(name);
      if (isSpringdoc(definition, beanFactory)) {
        definition.setLazyInit(true);
      }
    }
  }

  /** Springdoc's own classes, and beans made by a factory method of one of its configurations. */
  private static boolean isSpringdoc(
      BeanDefinition definition, ConfigurableListableBeanFactory beanFactory) {
    if (startsWithSpringdoc(definition.getBeanClassName())) {
      return true;
    }
    String factory = definition.getFactoryBeanName();
    return factory != null
        && (startsWithSpringdoc(factory)
            || beanFactory.containsBeanDefinition(factory)
                && startsWithSpringdoc(beanFactory.getBeanDefinition(factory).getBeanClassName()));
  }

  private static boolean startsWithSpringdoc(String className) {
    return className != null && className.startsWith(SPRINGDOC);
  }
}
