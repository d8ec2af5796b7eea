package org.cohesa.core.activity;

/**
 * How a solvent or blend behaves when water is added in any amount (the question behind "must mix with water" and
 * "must separate from water").
 *
 * @param kind   miscible in all tested proportions, separating at 1:1 by volume, or in between
 * @param basis  what decided (measured data when every tested mixture was decided by them)
 * @param detail one sentence: the proportions that split, and the source
 */
public record WaterBehaviour(Kind kind, WaterJudgement.Basis basis, String detail) {

    public enum Kind {
        /** one liquid phase at every tested water content ({@link WaterMiscibility#WATER_FRACTIONS}) */
        MISCIBLE,
        /** one phase at 1:1 by volume, but two at some other water content */
        PARTLY_MISCIBLE,
        /** two liquid phases at 1:1 by volume with water: it separates, as an extraction needs */
        IMMISCIBLE;

        public String label() {
            return switch (this) {
                case MISCIBLE -> "miscible";
                case PARTLY_MISCIBLE -> "partly miscible";
                case IMMISCIBLE -> "immiscible";
            };
        }
    }
}
