package org.redward.survey.internal;

import java.nio.file.Path;
import java.util.List;

import org.redward.api.formats.ReadOptions;
import org.redward.api.formats.SpectrumInputs;
import org.redward.api.formats.SpectrumRecord;

/** Spectra through the platform's reading facade ({@link SpectrumInputs}), which bounds each file's reading time. */
final class FacadeFeed implements Feed.Source {

    private final SpectrumInputs inputs;
    private final ReadOptions options;

    FacadeFeed(SpectrumInputs inputs, ReadOptions options) {
        this.inputs = inputs;
        this.options = options;
    }

    @Override
    public List<Path> expand(List<Path> paths) {
        return inputs.expand(paths);
    }

    @Override
    public Feed open(List<Path> paths) {
        SpectrumInputs.Stream s = inputs.open(paths, options);
        return new Feed() {
            @Override
            public SpectrumRecord next() {
                return s.hasNext() ? s.next() : null;
            }

            @Override
            public void close() {
                s.close();
            }
        };
    }
}
