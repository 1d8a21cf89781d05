package org.redward.survey.internal;

import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;

import org.redward.api.commands.CommandContext;
import org.redward.api.commands.UsageException;
import org.redward.api.survey.MeasureRequest;

import picocli.CommandLine;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** The options that {@code measure} and {@code compare} share (a picocli mixin), and the parsing both do. */
final class RunOptions {

    @Parameters(arity = "1..*", paramLabel = "INPUTS", description = "spectrum files, folders or list files (.list/.lst or @FILE)")
    List<Path> inputs = new ArrayList<>();
    @Option(names = "--templates", paramLabel = "ID", description = "template set for estimators that use one (default: standard if installed)")
    String templates;
    @Option(names = "--profile", paramLabel = "ID", description = "force an instrument profile")
    String profile;
    @Option(names = "--threads", paramLabel = "N", description = "worker threads (default: all cores)")
    int threads;
    @Option(names = "--time-limit", paramLabel = "SECONDS", description = "most time one spectrum may take (default: 60)")
    double timeLimitSeconds = 60;
    @Option(names = "--z-min", paramLabel = "Z", description = "lowest redshift searched (default: -0.005)")
    double zMin = -0.005;
    @Option(names = "--z-max", paramLabel = "Z", description = "highest redshift searched (default: 4)")
    double zMax = 4.0;

    /** The request these options describe (inputs resolved against the working directory). */
    MeasureRequest request(CommandContext ctx) {
        if (threads < 0) {
            throw new UsageException("--threads " + threads + ": must be positive");
        }
        if (!(timeLimitSeconds > 0)) {
            throw new UsageException("--time-limit " + timeLimitSeconds + ": must be positive");
        }
        if (!(zMin < zMax)) {
            throw new UsageException("--z-min " + zMin + " must be below --z-max " + zMax);
        }
        List<Path> resolved = new ArrayList<>();
        for (Path p : inputs) {
            String s = p.toString();
            resolved.add(s.startsWith("@") ? Path.of("@" + ctx.workingDirectory().resolve(s.substring(1)))
                    : ctx.workingDirectory().resolve(p));
        }
        return MeasureRequest.of(resolved).withTemplates(templates).withProfile(profile).withThreads(threads)
                .withTimeLimit(Duration.ofMillis(Math.round(timeLimitSeconds * 1000))).withRedshiftRange(zMin, zMax);
    }
}
