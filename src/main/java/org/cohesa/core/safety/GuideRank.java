package org.cohesa.core.safety;

/** Solvent-guide ranking classes of the CHEM21 method (Prat et al., Green Chem. 18 (2016) 288), best first. */
public enum GuideRank {
    RECOMMENDED("recommended"),
    PROBLEMATIC("problematic"),
    HAZARDOUS("hazardous");

    private final String label;

    GuideRank(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }

    /** The less favourable of two ranks. */
    public GuideRank worse(GuideRank other) {
        return other != null && other.ordinal() > ordinal() ? other : this;
    }
}
