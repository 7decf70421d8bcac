package org.tankwright.charts;

import java.text.FieldPosition;
import java.text.NumberFormat;
import java.text.ParsePosition;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

/** Axis tick labels through the one formatter: "100 kHz", "4.70 nF", "92.0 %". */
final class EngineeringFormat extends NumberFormat {

    private static final long serialVersionUID = 1L;
    private final Dimension dimension;
    private final int sig;

    EngineeringFormat(Dimension dimension, int sig) {
        this.dimension = dimension;
        this.sig = sig;
    }

    @Override
    public StringBuffer format(double number, StringBuffer toAppendTo, FieldPosition pos) {
        if (Math.abs(number) < 1e-300) {
            return toAppendTo.append(Quantities.format(0.0, dimension, 1));
        }
        return toAppendTo.append(Quantities.format(number, dimension, sig));
    }

    @Override
    public StringBuffer format(long number, StringBuffer toAppendTo, FieldPosition pos) {
        return format((double) number, toAppendTo, pos);
    }

    @Override
    public Number parse(String source, ParsePosition parsePosition) {
        double v = Quantities.parse(source.substring(parsePosition.getIndex()), dimension);
        parsePosition.setIndex(source.length());
        return v;
    }
}
