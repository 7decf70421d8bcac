package org.tankwright.circuit;

/** An immutable record of one solve: every element's complex rms voltage and current. */
public final class Solution {
    private final Network network;
    private final double frequency;
    private final double[] vRe;
    private final double[] vIm;
    private final double[] iRe;
    private final double[] iIm;

    Solution(Network network, double frequency, double[] vRe, double[] vIm, double[] iRe, double[] iIm) {
        this.network = network;
        this.frequency = frequency;
        this.vRe = vRe;
        this.vIm = vIm;
        this.iRe = iRe;
        this.iIm = iIm;
    }

    public Network network() {
        return network;
    }

    public double frequency() {
        return frequency;
    }

    /** Voltage V(a) − V(b) across the named element (rms phasor). */
    public Phasor voltage(String element) {
        int j = network.indexOf(element);
        return new Phasor(vRe[j], vIm[j]);
    }

    /** Current from a to b through the named element (rms phasor). */
    public Phasor current(String element) {
        int j = network.indexOf(element);
        return new Phasor(iRe[j], iIm[j]);
    }
}
