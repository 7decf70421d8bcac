package org.tankwright.report;

import org.hipparchus.complex.Complex;
import org.hipparchus.complex.ComplexField;
import org.hipparchus.linear.Array2DRowFieldMatrix;
import org.hipparchus.linear.ArrayFieldVector;
import org.hipparchus.linear.FieldLUDecomposition;
import org.hipparchus.linear.FieldMatrix;
import org.hipparchus.linear.FieldVector;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;

/**
 * An independent AC solve of a parsed netlist by modified nodal analysis (Ho, Ruehli, Brennan,
 * IEEE Trans. Circuits Syst. 22(6), 1975), with the linear algebra of Hipparchus: node voltages,
 * plus the branch currents of voltage sources and inductors (so the mutual term of a K line can be
 * stamped). Used to check that the netlist reproduces the operating point.
 */
final class NetlistSolver {
    /** Node voltages (index = node number) and branch currents by element name. */
    record Solution(java.util.Map<Integer, Complex> nodes, java.util.Map<String, Complex> branches) {
        Complex v(int node) {
            return node == 0 ? Complex.ZERO : nodes.get(node);
        }
    }

    private NetlistSolver() {
    }

    static Solution solve(NetlistParser.Netlist n, double f) {
        double w = 2 * Math.PI * f;
        TreeSet<Integer> nodeSet = new TreeSet<>();
        List<String> branches = new ArrayList<>();
        for (NetlistParser.Element e : n.elements().values()) {
            nodeSet.add(e.a());
            nodeSet.add(e.b());
            if (e.name().startsWith("V") || e.name().startsWith("L")) {
                branches.add(e.name());
            }
        }
        nodeSet.remove(0);
        List<Integer> nodes = new ArrayList<>(nodeSet);
        int size = nodes.size() + branches.size();
        FieldMatrix<Complex> a = new Array2DRowFieldMatrix<>(ComplexField.getInstance(), size, size);
        FieldVector<Complex> rhs = new ArrayFieldVector<>(ComplexField.getInstance(), size);
        for (NetlistParser.Element e : n.elements().values()) {
            int i = nodes.indexOf(e.a());
            int j = nodes.indexOf(e.b());
            char kind = e.name().charAt(0);
            if (kind == 'R' || kind == 'C') {
                Complex y = kind == 'R' ? new Complex(1 / e.value()) : new Complex(0, w * e.value());
                stamp(a, i, j, y);
            } else if (kind == 'I') {
                // current flows from a through the source to b, i.e. into node b
                if (i >= 0) {
                    rhs.setEntry(i, rhs.getEntry(i).subtract(e.value()));
                }
                if (j >= 0) {
                    rhs.setEntry(j, rhs.getEntry(j).add(e.value()));
                }
            } else {
                int b = nodes.size() + branches.indexOf(e.name());
                if (i >= 0) {
                    a.addToEntry(i, b, Complex.ONE);
                    a.addToEntry(b, i, Complex.ONE);
                }
                if (j >= 0) {
                    a.addToEntry(j, b, Complex.ONE.negate());
                    a.addToEntry(b, j, Complex.ONE.negate());
                }
                if (kind == 'V') {
                    rhs.setEntry(b, new Complex(e.value()));
                } else {
                    a.addToEntry(b, b, new Complex(0, -w * e.value()));
                }
            }
        }
        if (n.k1() != null) {
            double l1 = n.elements().get(n.k1()).value();
            double l2 = n.elements().get(n.k2()).value();
            Complex zm = new Complex(0, -w * n.k() * Math.sqrt(l1 * l2));
            int b1 = nodes.size() + branches.indexOf(n.k1());
            int b2 = nodes.size() + branches.indexOf(n.k2());
            a.addToEntry(b1, b2, zm);
            a.addToEntry(b2, b1, zm);
        }
        FieldVector<Complex> x = new FieldLUDecomposition<>(a).getSolver().solve(rhs);
        java.util.Map<Integer, Complex> nv = new java.util.HashMap<>();
        for (int i = 0; i < nodes.size(); i++) {
            nv.put(nodes.get(i), x.getEntry(i));
        }
        java.util.Map<String, Complex> bc = new java.util.HashMap<>();
        for (int i = 0; i < branches.size(); i++) {
            bc.put(branches.get(i), x.getEntry(nodes.size() + i));
        }
        return new Solution(nv, bc);
    }

    private static void stamp(FieldMatrix<Complex> a, int i, int j, Complex y) {
        if (i >= 0) {
            a.addToEntry(i, i, y);
        }
        if (j >= 0) {
            a.addToEntry(j, j, y);
        }
        if (i >= 0 && j >= 0) {
            a.addToEntry(i, j, y.negate());
            a.addToEntry(j, i, y.negate());
        }
    }
}
