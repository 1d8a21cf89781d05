package org.redward.survey.internal;

import java.nio.file.Path;
import java.util.List;

import org.osgi.framework.BundleContext;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.redward.api.commands.Command;
import org.redward.api.commands.CommandContext;
import org.redward.cli.options.CommandOptions;

import picocli.CommandLine;
import picocli.CommandLine.Option;

/** {@code redward survey-package}: everything a Spark cluster needs to run the same measurement. */
@Component(property = {Command.NAME + "=survey-package",
        Command.SUMMARY + "=package the survey job for a Spark cluster: jars, bundles, the spark-submit line"})
public final class SurveyPackageCommand implements Command {

    private BundleContext bundleContext;

    @Activate
    void activate(BundleContext bc) {
        this.bundleContext = bc;
    }

    @CommandLine.Command(name = "survey-package", mixinStandardHelpOptions = true,
            description = {"Writes into --out the Spark job, the API jars it shares with the bundles, the bundles"
                    + " (the product's and every --bundles folder's) as a folder and as bundles.zip, and submit.sh"
                    + " with the exact spark-submit line. Needs the survey feature (mvn -B package -DskipTests -pl features/survey -am)."})
    static final class Args {
        @Option(names = "--out", required = true, paramLabel = "DIR", description = "folder to write the package into")
        Path out;
        @Option(names = "--master", paramLabel = "URL", description = "cluster master for the submit line (default: ${DEFAULT-VALUE})")
        String master = "yarn";
    }

    @Override
    public int run(CommandContext ctx, List<String> arguments) throws Exception {
        Args a = new Args();
        if (!CommandOptions.parse(a, arguments, ctx.out())) {
            return 0;
        }
        Path out = ctx.workingDirectory().resolve(a.out);
        String line = new SparkEngine(ctx, bundleContext::getProperty).packageFor(out, a.master);
        ctx.out().println("survey job packaged in " + out);
        ctx.out().println("run it from that folder with:");
        ctx.out().println("  OUT=<output folder> ./submit.sh [--estimator ID] [--frame cmb] INPUTS...");
        ctx.out().println("which runs:");
        ctx.out().println("  " + line);
        return 0;
    }
}
