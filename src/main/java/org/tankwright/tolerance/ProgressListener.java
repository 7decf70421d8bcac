package org.tankwright.tolerance;

/** Told how far a study has got: about a hundred calls per study, and one at the end. */
@FunctionalInterface
public interface ProgressListener {
    ProgressListener NONE = (done, total) -> { };

    void progress(int done, int total);
}
