package org.tankwright.coupling;

import org.tankwright.magnetics.Filament;

import java.util.List;

/** Mutual inductance of two filament lists: the entry point for one-off sums. */
public final class FilamentMutual {
    private FilamentMutual() {
    }

    /**
     * Mutual inductance in henries between the coil made of filaments {@code a} and the coil made
     * of {@code b}, each list carrying one series current; positive when both currents circulate
     * the same way. Sums every filament pair (rings by {@link RingKernel}, segments by
     * {@link SegmentKernel}, mixed pairs by quadrature).
     */
    public static double mutual(List<? extends Filament> a, List<? extends Filament> b) {
        return new PairSum(FilamentSet.of(a), FilamentSet.of(b)).mutual(0, 0, 0);
    }
}
