package org.tankwright.circuit;

/**
 * Output and diode stresses of a full-bridge rectifier from the fundamental at its input.
 * Capacitive filter: sine input current of peak Ip, square input voltage ±Vdc; Idc = 2·Ip/π,
 * each diode average Ip/π, rms Ip/2, peak Ip, reverse Vdc. Inductive filter: square input current
 * ±Idc, sine input voltage of peak Vp; Vdc = 2·Vp/π, each diode average Idc/2, rms Idc/√2, peak
 * Idc, reverse Vp. (Steigerwald, IEEE TPEL 3(2), 1988 waveforms; the diode figures follow from them.)
 */
public record RectifierStress(Load.Filter filter, double vdc, double idc, double diodeAverage, double diodeRms,
                              double diodePeak, double diodeReverse) {

    /** From the rms fundamental voltage and current at the rectifier input. */
    public static RectifierStress of(Load.Filter filter, double vAcRms, double iAcRms) {
        if (filter == Load.Filter.CAPACITIVE) {
            double ip = Math.sqrt(2) * iAcRms;
            double vdc = vAcRms / Source.SQUARE_FUNDAMENTAL;
            double idc = 2 * ip / Math.PI;
            return new RectifierStress(filter, vdc, idc, idc / 2, ip / 2, ip, vdc);
        }
        double vp = Math.sqrt(2) * vAcRms;
        double idc = iAcRms / Source.SQUARE_FUNDAMENTAL;
        return new RectifierStress(filter, 2 * vp / Math.PI, idc, idc / 2, idc / Math.sqrt(2), idc, vp);
    }
}
