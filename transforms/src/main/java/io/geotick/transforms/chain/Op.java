package io.geotick.transforms.chain;

import io.geotick.transforms.StepDescription;

/** One step of a chain, applied in place to interleaved triples. Implementations are immutable. */
interface Op {
    /** Applies the step to {@code count} triples of {@code buf} from {@code off}, in place; allocates nothing. */
    void apply(double[] buf, int off, int count);

    /** The reverse step. */
    Op inverse();

    /** What the step does. */
    StepDescription description();
}
