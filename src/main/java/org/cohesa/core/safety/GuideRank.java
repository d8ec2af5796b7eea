package org.cohesa.core.safety;

/** Solvent-guide ranking classes of the CHEM21 method (Prat et al., Green Chem. 18 (2016) 288), best first. */
public enum GuideRank {
    RECOMMENDED("recommended"),
    PROBLEMATIC("problematic"),
    HAZARDOUS("hazardous"),
    /** Only the paper's panel assigns it (final ranking of Table 7); the computed ranking by default never does. */
    HIGHLY_HAZARDOUS("highly hazardous");

    private final String label;

    GuideRank(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }

    /** The less favourable of two ranks. */
    public GuideRank worse(GuideRank other) {
        // ordinal order is best first, so the larger ordinal is the less favourable rank
        return other != null && other.ordinal() > ordinal() ? other : this;
    }

    /** Parses the words used in chem21-ranks.csv ("recommended", "problematic", "hazardous", "highly-hazardous"). */
    static GuideRank parse(String word) {
        return switch (word.strip()) {
            case "recommended" -> RECOMMENDED;
            case "problematic" -> PROBLEMATIC;
            case "hazardous" -> HAZARDOUS;
            case "highly-hazardous" -> HIGHLY_HAZARDOUS;
            default -> throw new IllegalArgumentException("unknown CHEM21 rank: " + word);
        };
    }
}
