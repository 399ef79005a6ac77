package org.spanlift.geometry;

import java.util.List;

/**
 * A planform given by stations, with chord, leading edge and twist linear in y between them. The
 * spanwise integrals are exact for that piecewise-linear geometry.
 *
 * @param stations the stations, y increasing from root to tip (copied)
 */
public record StationPlanform(List<Station> stations) implements Planform {

    /** Copies the stations and checks that there are at least two, y increasing from root to tip. */
    public StationPlanform {
        stations = List.copyOf(stations);
        if (stations.size() < 2) {
            throw new IllegalArgumentException("a planform needs at least two stations");
        }
        for (int i = 1; i < stations.size(); i++) {
            if (!(stations.get(i).y() > stations.get(i - 1).y())) {
                throw new IllegalArgumentException("station y must increase from root to tip");
            }
        }
    }

    @Override
    public double yStart() {
        return stations.get(0).y();
    }

    @Override
    public double yEnd() {
        return stations.get(stations.size() - 1).y();
    }

    private int interval(double y) {
        int last = stations.size() - 2;
        for (int i = 0; i < last; i++) {
            if (y < stations.get(i + 1).y()) {
                return i;
            }
        }
        return last;
    }

    private double fraction(int i, double y) {
        double y0 = stations.get(i).y();
        double y1 = stations.get(i + 1).y();
        return (y - y0) / (y1 - y0);
    }

    private interface Field {
        double of(Station s);
    }

    private double linear(double y, Field f) {
        int i = interval(y);
        double w = fraction(i, y);
        return (1 - w) * f.of(stations.get(i)) + w * f.of(stations.get(i + 1));
    }

    @Override
    public double chord(double y) {
        return linear(y, Station::chord);
    }

    @Override
    public double noseX(double y) {
        return linear(y, Station::noseX);
    }

    @Override
    public double noseZ(double y) {
        return linear(y, Station::noseZ);
    }

    @Override
    public double twist(double y) {
        return linear(y, Station::twist);
    }

    @Override
    public SectionBlend section(double y) {
        int i = interval(y);
        return new SectionBlend(stations.get(i).section(), stations.get(i + 1).section(), fraction(i, y));
    }

    @Override
    public List<String> sectionNames() {
        return stations.stream().map(Station::section).distinct().toList();
    }

    @Override
    public List<Double> stationYs() {
        return stations.stream().map(Station::y).toList();
    }

    @Override
    public double area() {
        return integral(Station::chord, s -> 1);
    }

    @Override
    public double chordSquaredIntegral() {
        return integral(Station::chord, Station::chord);
    }

    @Override
    public double chordNoseXIntegral() {
        return integral(Station::chord, Station::noseX);
    }

    @Override
    public double chordYIntegral() {
        return integral(Station::chord, Station::y);
    }

    @Override
    public double chordNoseZIntegral() {
        return integral(Station::chord, Station::noseZ);
    }

    /** Exact integral of f*g over y for f and g linear on each interval (Simpson is exact for quadratics). */
    private double integral(Field f, Field g) {
        double sum = 0;
        for (int i = 0; i + 1 < stations.size(); i++) {
            Station a = stations.get(i);
            Station b = stations.get(i + 1);
            double fm = 0.5 * (f.of(a) + f.of(b));
            double gm = 0.5 * (g.of(a) + g.of(b));
            double h = b.y() - a.y();
            sum += h / 6 * (f.of(a) * g.of(a) + 4 * fm * gm + f.of(b) * g.of(b));
        }
        return sum;
    }

    @Override
    public StationPlanform withWashoutChange(double change) {
        double root = yStart();
        double length = yEnd() - root;
        List<Station> changed = new java.util.ArrayList<>();
        for (Station st : stations) {
            changed.add(new Station(st.y(), st.chord(), st.noseX(), st.noseZ(),
                    st.twist() - change * (st.y() - root) / length, st.section()));
        }
        return new StationPlanform(changed);
    }
}
