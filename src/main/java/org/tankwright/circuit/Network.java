package org.tankwright.circuit;

import java.util.ArrayList;
import java.util.List;

/**
 * A phasor network as data: {@code nodeCount} nodes (0 is the reference), two-terminal elements
 * and coupled pairs. Immutable; variants are made with {@link #withElement} and
 * {@link #withCoupling}. New topologies (LCC and others) are new data, solved by the same
 * {@link PhasorSolver}.
 */
public record Network(int nodeCount, List<Element> elements, List<Coupling> couplings) {

    public Network {
        elements = List.copyOf(elements);
        couplings = List.copyOf(couplings);
        if (nodeCount < 2) {
            throw new IllegalArgumentException("a network needs at least 2 nodes, got " + nodeCount);
        }
        for (int i = 0; i < elements.size(); i++) {
            Element e = elements.get(i);
            if (e.a() >= nodeCount || e.b() >= nodeCount) {
                throw new IllegalArgumentException("element " + e.name() + " uses a node outside 0.." + (nodeCount - 1));
            }
            for (int j = 0; j < i; j++) {
                if (elements.get(j).name().equals(e.name())) {
                    throw new IllegalArgumentException("element name " + e.name() + " is used twice");
                }
            }
        }
        for (Coupling k : couplings) {
            if (k.first() >= elements.size() || k.second() >= elements.size()) {
                throw new IllegalArgumentException("coupling refers to a missing element");
            }
            Element p = elements.get(k.first());
            Element s = elements.get(k.second());
            double limit = Math.sqrt(p.l() * s.l());
            if (Math.abs(k.m()) > limit * (1 + 1e-12)) {
                throw new IllegalArgumentException("mutual inductance " + k.m() + " H between " + p.name() + " and "
                        + s.name() + " exceeds √(L1·L2) = " + limit + " H (coupling factor above 1)");
            }
        }
    }

    /** Index of the element with this name. */
    public int indexOf(String name) {
        for (int i = 0; i < elements.size(); i++) {
            if (elements.get(i).name().equals(name)) {
                return i;
            }
        }
        throw new IllegalArgumentException("no element named " + name + " in the network");
    }

    /** Whether an element with this name exists. */
    public boolean has(String name) {
        for (Element e : elements) {
            if (e.name().equals(name)) {
                return true;
            }
        }
        return false;
    }

    public Element element(String name) {
        return elements.get(indexOf(name));
    }

    /** A copy with the named element replaced. */
    public Network withElement(String name, Element replacement) {
        List<Element> list = new ArrayList<>(elements);
        list.set(indexOf(name), replacement);
        return new Network(nodeCount, list, couplings);
    }

    /** A copy with every coupling's mutual inductance set to {@code m}. */
    public Network withCoupling(double m) {
        List<Coupling> list = new ArrayList<>();
        for (Coupling k : couplings) {
            list.add(new Coupling(k.first(), k.second(), m));
        }
        return new Network(nodeCount, elements, list);
    }

    /** Index of the (first) source element. */
    public int sourceIndex() {
        for (int i = 0; i < elements.size(); i++) {
            if (elements.get(i).isSource()) {
                return i;
            }
        }
        throw new IllegalArgumentException("the network has no source");
    }

    public static Builder builder() {
        return new Builder();
    }

    /** Collects nodes, elements and couplings; {@link #node()} hands out fresh node numbers. */
    public static final class Builder {
        private int nodes = 1;
        private final List<Element> elements = new ArrayList<>();
        private final List<Coupling> couplings = new ArrayList<>();

        /** A new node number (0 is the reference and always exists). */
        public int node() {
            return nodes++;
        }

        public Builder add(Element e) {
            elements.add(e);
            return this;
        }

        /** Couples two already added elements by name with mutual inductance m. */
        public Builder couple(String first, String second, double m) {
            couplings.add(new Coupling(find(first), find(second), m));
            return this;
        }

        private int find(String name) {
            for (int i = 0; i < elements.size(); i++) {
                if (elements.get(i).name().equals(name)) {
                    return i;
                }
            }
            throw new IllegalArgumentException("no element named " + name + " to couple");
        }

        public Network build() {
            return new Network(Math.max(nodes, 2), elements, couplings);
        }
    }
}
