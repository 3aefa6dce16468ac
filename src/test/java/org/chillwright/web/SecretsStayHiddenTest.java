package org.chillwright.web;

import static org.assertj.core.api.Assertions.assertThat;

import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import java.io.IOException;
import java.lang.reflect.RecordComponent;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The rules that keep a secret from being echoed, checked over the whole code base so that a new form
 * or request inherits them: which fields count as secret, every record holding one hides it in its
 * {@code toString} (Spring logs bodies and forms through it), and no template fills a secret input.
 */
class SecretsStayHiddenTest {

    record Login(String username, String password) {
    }

    record Key(String label, @Secret String value) {
    }

    record Holder(String owner, Key key) {
    }

    @Test
    void fieldsNamedLikeSecretsAreSecretWithoutTheMarker() {
        assertThat(SecretFields.isSecret(Login.class, "password")).isTrue();
        assertThat(SecretFields.isSecret(null, "confirmPassword")).isTrue();
        assertThat(SecretFields.isSecret(null, "apiToken")).isTrue();
        assertThat(SecretFields.isSecret(Login.class, "username")).isFalse();
    }

    @Test
    void markedFieldsAreSecretWhateverTheirNameAlsoWhenNested() {
        assertThat(SecretFields.isSecret(Key.class, "value")).isTrue();
        assertThat(SecretFields.isSecret(Holder.class, "key.value")).isTrue();
        assertThat(SecretFields.isSecret(Holder.class, "key.label")).isFalse();
        assertThat(SecretFields.isSecret(Holder.class, "owner")).isFalse();
    }

    @Test
    void recordTextHidesEverySecretComponentAndShowsTheRest() {
        assertThat(SecretFields.toString(new Login("ana", "hunter2-long-enough")))
                .isEqualTo("Login[username=ana, password=[hidden]]");
        assertThat(SecretFields.toString(new Key("ci", "abc123"))).isEqualTo("Key[label=ci, value=[hidden]]");
    }

    private static boolean secret(RecordComponent component) {
        return SecretFields.namedLikeSecret(component.getName()) || component.isAnnotationPresent(Secret.class);
    }

    /** Each production record with a secret component, built with a distinct value per component. */
    @Test
    void everyProductionRecordHoldingASecretHidesItInItsText() throws Exception {
        var production = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.chillwright");
        var checked = new ArrayList<String>();
        for (JavaClass javaClass : production) {
            if (!javaClass.isRecord()) {
                continue;
            }
            Class<?> type = javaClass.reflect();
            var components = type.getRecordComponents();
            if (Stream.of(components).noneMatch(SecretsStayHiddenTest::secret)) {
                continue;
            }
            var arguments = new Object[components.length];
            var types = new Class<?>[components.length];
            for (int i = 0; i < components.length; i++) {
                types[i] = components[i].getType();
                arguments[i] = types[i] == String.class ? "probe-" + components[i].getName() : null;
            }
            var constructor = type.getDeclaredConstructor(types);
            constructor.setAccessible(true);
            String text = constructor.newInstance(arguments).toString();
            for (var component : components) {
                if (secret(component) && component.getType() == String.class) {
                    assertThat(text).as(type.getName()).doesNotContain("probe-" + component.getName());
                }
            }
            checked.add(type.getSimpleName());
        }
        assertThat(checked).as("the records that hold passwords were found").contains(
                "CreateUserRequest", "PasswordResetRequest", "OwnPasswordRequest", "PasswordChangeForm");
    }

    private static final Pattern INPUT = Pattern.compile("<input\\b[^>]*>", Pattern.DOTALL);
    private static final Pattern NAME = Pattern.compile("\\b(?:name|th:field)=\"\\*?\\{?([A-Za-z_]+)\\}?\"");

    /** A secret input is always empty when a page is shown, even after a refused submit. */
    @Test
    void noTemplateFillsASecretInput() throws IOException {
        var offenders = new ArrayList<String>();
        List<Path> templates;
        try (var files = Files.walk(Path.of("src/main/resources/templates"))) {
            templates = files.filter(p -> p.toString().endsWith(".html")).toList();
        }
        int secretInputs = 0;
        for (Path template : templates) {
            var inputs = INPUT.matcher(Files.readString(template));
            while (inputs.find()) {
                String input = inputs.group();
                var name = NAME.matcher(input);
                boolean secretInput = input.contains("type=\"password\"") || name.find() && SecretFields.namedLikeSecret(name.group(1));
                if (!secretInput) {
                    continue;
                }
                secretInputs++;
                if (input.contains("th:field") || input.contains("th:value") || input.matches("(?s).*\\svalue=.*")) {
                    offenders.add(template.getFileName() + ": " + input);
                }
            }
        }
        assertThat(secretInputs).as("password inputs found in the templates").isGreaterThanOrEqualTo(5);
        assertThat(offenders).isEmpty();
    }
}
