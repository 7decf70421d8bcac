package org.tankwright.magnetics;

import java.util.function.DoubleUnaryOperator;
import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;

/** Composite Gauss-Legendre rule on equal panels, with nodes and weights from Hipparchus (test reference). */
final class CompositeGauss {
    private final double[] nodes;
    private final double[] weights;

    CompositeGauss(int points) {
        GaussIntegrator rule = new GaussIntegratorFactory().legendre(points, 0, 1);
        nodes = new double[rule.getNumberOfPoints()];
        weights = new double[nodes.length];
        for (int i = 0; i < nodes.length; i++) {
            nodes[i] = rule.getPoint(i);
            weights[i] = rule.getWeight(i);
        }
    }

    double integrate(DoubleUnaryOperator f, double a, double b, int panels) {
        double h = (b - a) / panels;
        double sum = 0;
        for (int p = 0; p < panels; p++) {
            for (int i = 0; i < nodes.length; i++) {
                sum += weights[i] * f.applyAsDouble(a + h * (p + nodes[i]));
            }
        }
        return sum * h;
    }
}
