package org.chillwright.web;

import jakarta.validation.ConstraintViolation;
import org.springframework.boot.validation.MessageInterpolatorFactory;
import org.springframework.context.ApplicationContext;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.springframework.validation.BindingResult;
import org.springframework.validation.beanvalidation.LocalValidatorFactoryBean;

/**
 * The application's Bean Validation validator (it takes the place of Spring Boot's default, with the same
 * message interpolation). It differs in one way: a constraint broken by a secret field ({@link SecretFields})
 * records no rejected value. The value then cannot reach an error body, a form shown again, or the
 * exception message that Spring logs at DEBUG ("rejected value [...]").
 */
@Configuration(proxyBeanMethods = false)
class SecretHidingValidation {

    @Bean
    static LocalValidatorFactoryBean defaultValidator(ApplicationContext context) {
        var validator = new SecretHidingValidator();
        validator.setMessageInterpolator(new MessageInterpolatorFactory(context).getObject());
        return validator;
    }

    static final class SecretHidingValidator extends LocalValidatorFactoryBean {

        @Override
        protected Object getRejectedValue(String field, ConstraintViolation<Object> violation,
                BindingResult bindingResult) {
            Object target = bindingResult.getTarget();
            Class<?> type = target != null ? target.getClass() : violation.getRootBeanClass();
            if (SecretFields.isSecret(type, field)) {
                return null;
            }
            return super.getRejectedValue(field, violation, bindingResult);
        }
    }
}
