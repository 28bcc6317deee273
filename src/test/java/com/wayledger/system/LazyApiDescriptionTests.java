package com.wayledger.system;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.support.BeanDefinitionBuilder;
import org.springframework.beans.factory.support.DefaultListableBeanFactory;

/** Springdoc's beans become lazy; every other bean keeps the eagerness it was declared with. */
class LazyApiDescriptionTests {

  @Test
  void springdocBeansAndTheirFactoryMethodsBecomeLazyOthersStayEager() {
    DefaultListableBeanFactory factory = new DefaultListableBeanFactory();
    factory.registerBeanDefinition(
        "org.springdoc.core.configuration.SpringDocConfiguration",
        BeanDefinitionBuilder.genericBeanDefinition(
                "org.springdoc.core.configuration.SpringDocConfiguration")
            .getBeanDefinition());
    factory.registerBeanDefinition(
        "openApiResource",
        BeanDefinitionBuilder.genericBeanDefinition(
                "org.springdoc.webmvc.api.OpenApiWebMvcResource")
            .getBeanDefinition());
    factory.registerBeanDefinition(
        "springDocProviders",
        BeanDefinitionBuilder.genericBeanDefinition()
            .setFactoryMethodOnBean(
                "springDocProviders", "org.springdoc.core.configuration.SpringDocConfiguration")
            .getBeanDefinition());
    factory.registerBeanDefinition(
        "siteService",
        BeanDefinitionBuilder.genericBeanDefinition("com.wayledger.site.SiteService")
            .getBeanDefinition());
    factory.registerBeanDefinition(
        "webConfig",
        BeanDefinitionBuilder.genericBeanDefinition("com.wayledger.system.StaticAssets")
            .getBeanDefinition());
    factory.registerBeanDefinition(
        "resourceHandlerMapping",
        BeanDefinitionBuilder.genericBeanDefinition()
            .setFactoryMethodOnBean("resourceHandlerMapping", "webConfig")
            .getBeanDefinition());

    new LazyApiDescription().postProcessBeanFactory(factory);

    assertThat(
            factory
                .getBeanDefinition("org.springdoc.core.configuration.SpringDocConfiguration")
                .isLazyInit())
        .as("springdoc configuration")
        .isTrue();
    assertThat(factory.getBeanDefinition("openApiResource").isLazyInit())
        .as("springdoc controller")
        .isTrue();
    assertThat(factory.getBeanDefinition("springDocProviders").isLazyInit())
        .as("bean of a springdoc factory method")
        .isTrue();
    assertThat(factory.getBeanDefinition("siteService").isLazyInit()).as("own service").isFalse();
    assertThat(factory.getBeanDefinition("resourceHandlerMapping").isLazyInit())
        .as("bean of an own factory method")
        .isFalse();
  }
}
