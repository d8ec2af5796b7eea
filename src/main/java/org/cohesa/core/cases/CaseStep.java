package org.cohesa.core.cases;

/** The steps of a case, in the order the work goes; the names are Cohesa's own. */
public enum CaseStep {
    MATERIAL("Material", "what must dissolve"),
    LIMITS("Limits", "what the liquid may not be"),
    CANDIDATES("Candidates", "what qualifies, and which to try"),
    CHECKS("Checks", "safety, drying, phases of the chosen ones"),
    RECORD("Record", "the substitution filed, reviewed, decided");

    private final String title;
    private final String question;

    CaseStep(String title, String question) {
        this.title = title;
        this.question = question;
    }

    public String title() {
        return title;
    }

    /** What the step answers, shown under its title. */
    public String question() {
        return question;
    }
}
