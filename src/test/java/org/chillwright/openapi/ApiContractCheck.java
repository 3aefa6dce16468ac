package org.chillwright.openapi;

import jakarta.servlet.DispatcherType;
import java.util.ArrayList;
import java.util.List;
import org.springframework.beans.factory.support.BeanDefinitionBuilder;
import org.springframework.beans.factory.support.BeanDefinitionRegistry;
import org.springframework.boot.web.servlet.FilterRegistrationBean;
import org.springframework.context.ConfigurableApplicationContext;
import org.springframework.core.Ordered;
import org.springframework.test.context.ContextConfigurationAttributes;
import org.springframework.test.context.ContextCustomizer;
import org.springframework.test.context.ContextCustomizerFactory;
import org.springframework.test.context.MergedContextConfiguration;
import org.springframework.test.context.TestContext;
import org.springframework.test.context.TestExecutionListener;

/**
 * Makes every Spring test hold the API's answers to the OpenAPI document: each test context gets the
 * {@link ApiContractFilter} (MockMvc and real HTTP alike), and a test during which an answer did not fit the
 * document fails, listing what did not fit. Both parts are registered in {@code META-INF/spring.factories}, so no
 * test needs to ask for them.
 */
public final class ApiContractCheck {

    private static final List<String> VIOLATIONS = new ArrayList<>();

    private ApiContractCheck() {
    }

    static void record(List<String> violations) {
        if (!violations.isEmpty()) {
            synchronized (VIOLATIONS) {
                VIOLATIONS.addAll(violations);
            }
        }
    }

    /** What did not fit since the last call, and forgets it. */
    static List<String> drain() {
        synchronized (VIOLATIONS) {
            var drained = List.copyOf(VIOLATIONS);
            VIOLATIONS.clear();
            return drained;
        }
    }

    private static void failOnViolations(String when) {
        var violations = drain();
        if (!violations.isEmpty()) {
            throw new AssertionError("The API answered " + when + " in ways " + ApiContract.COMMITTED
                    + " does not describe (if the document is what changed, OpenApiDocumentTest says how to "
                    + "renew it):\n  " + String.join("\n  ", violations));
        }
    }

    /** Adds the filter to every test context. */
    public static final class Factory implements ContextCustomizerFactory {

        private static final ContextCustomizer ADD_FILTER = Factory::addFilter;

        @Override
        public ContextCustomizer createContextCustomizer(Class<?> testClass,
                                                         List<ContextConfigurationAttributes> configAttributes) {
            return ADD_FILTER;
        }

        private static void addFilter(ConfigurableApplicationContext context, MergedContextConfiguration config) {
            if (context.getBeanFactory() instanceof BeanDefinitionRegistry registry) {
                registry.registerBeanDefinition("apiContractFilter", BeanDefinitionBuilder
                        .genericBeanDefinition(FilterRegistrationBean.class, Factory::registration).getBeanDefinition());
            }
        }

        private static FilterRegistrationBean<ApiContractFilter> registration() {
            var registration = new FilterRegistrationBean<>(new ApiContractFilter());
            registration.setDispatcherTypes(DispatcherType.REQUEST, DispatcherType.ERROR);
            registration.setOrder(Ordered.HIGHEST_PRECEDENCE);
            return registration;
        }
    }

    /** Fails the test (or the class, for calls made before or after all its tests) that saw a misfit. */
    public static final class Listener implements TestExecutionListener {

        @Override
        public void beforeTestClass(TestContext testContext) {
            drain();
        }

        @Override
        public void afterTestMethod(TestContext testContext) {
            failOnViolations("during " + testContext.getTestMethod().getName());
        }

        @Override
        public void afterTestClass(TestContext testContext) {
            failOnViolations("in " + testContext.getTestClass().getSimpleName() + " outside its tests");
        }
    }
}
