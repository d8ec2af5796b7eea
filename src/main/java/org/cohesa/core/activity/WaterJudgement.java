package org.cohesa.core.activity;

/**
 * Whether a liquid that may contain water separates into two liquid phases, and what decided it.
 *
 * @param splits true when two liquid phases are expected at that composition and temperature
 * @param basis  what decided: published mutual solubilities, those plus the activity model for the other pairs, or the model
 * @param model  "published mutual solubility" or the activity model that served (e.g. "UNIFAC LLE (Magnussen 1981)")
 * @param detail one readable sentence with the numbers behind the verdict and the source key
 */
public record WaterJudgement(boolean splits, Basis basis, String model, String detail) {

    /** What decided a judgement. */
    public enum Basis {
        /** published mutual-solubility data for the pair with water */
        MEASURED,
        /** published data for every pair with water, the activity model for the pairs without water */
        MEASURED_AND_MODEL,
        /** the liquid–liquid activity model alone ({@link Miscibility}) */
        MODEL;

        /** Lower-case words for tables and JSON. */
        public String label() {
            return switch (this) {
                case MEASURED -> "measured";
                case MEASURED_AND_MODEL -> "measured with water, model elsewhere";
                case MODEL -> "model";
            };
        }
    }

    public static final String MEASURED_MODEL = "published mutual solubility";
}
