package org.spanlift.cli;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import org.junit.jupiter.api.Test;

import com.tngtech.archunit.base.DescribedPredicate;
import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;

/**
 * The command line is a thin layer: no subcommand uses another subcommand (shared logic lives in the core
 * or in the option mixins and writers), and nothing outside the command classes reaches into one.
 */
class CommandIndependenceTest {

    private static final JavaClasses CLI = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("org.spanlift.cli");

    private static final DescribedPredicate<JavaClass> SUBCOMMAND = DescribedPredicate.describe("a subcommand",
            c -> c.getPackageName().equals("org.spanlift.cli") && c.getSimpleName().endsWith("Command")
                    && !c.getSimpleName().equals("SpanliftCommand"));

    @Test
    void noSubcommandUsesAnother() {
        for (JavaClass command : CLI.that(SUBCOMMAND)) {
            noClasses().that().haveFullyQualifiedName(command.getName())
                    .should().dependOnClassesThat(SUBCOMMAND.and(DescribedPredicate.describe("another one",
                            c -> !c.getName().equals(command.getName())
                            && !c.getName().startsWith(command.getName() + "$"))))
                    .check(CLI);
        }
    }

    @Test
    void onlyTheRootCommandKnowsTheSubcommands() {
        noClasses().that().doNotHaveSimpleName("SpanliftCommand").and(DescribedPredicate.not(SUBCOMMAND))
                .should().dependOnClassesThat(SUBCOMMAND).check(CLI);
    }
}
