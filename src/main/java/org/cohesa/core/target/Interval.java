package org.cohesa.core.target;

/** A closed interval [low, high] of one fitted quantity, MPa^½. */
public record Interval(double low, double high) {

    public Interval {
        if (!(low <= high)) {
            throw new IllegalArgumentException("interval needs low ≤ high, got " + low + " and " + high);
        }
    }

    public boolean contains(double v) {
        return v >= low && v <= high;
    }

    public double width() {
        return high - low;
    }
}
