package org.cohesa.core.solvent;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.cohesa.core.InvalidInputException;
import org.junit.jupiter.api.Test;

class BlendSpecTest {

    @Test
    void namesWithCommasParse() {
        List<BlendSpec.Part> parts = BlendSpec.parse("--blend", "1,4-dioxane:0.3,water:0.7");
        assertEquals(List.of(new BlendSpec.Part("1,4-dioxane", 0.3), new BlendSpec.Part("water", 0.7)), parts);
    }

    @Test
    void spacesPercentagesAndSemicolonsAreAccepted() {
        List<BlendSpec.Part> parts = BlendSpec.parse("--blend", " n-butyl acetate : 60% ; 1,2-dichloroethane:40 %");
        assertEquals("n-butyl acetate", parts.get(0).name());
        assertEquals(0.6, parts.get(0).fraction(), 1e-12);
        assertEquals("1,2-dichloroethane", parts.get(1).name());
        assertEquals(0.4, parts.get(1).fraction(), 1e-12);
    }

    @Test
    void badSpecsNameTheFieldAndValue() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> BlendSpec.parse("--blend", "toluene:0.5,ethanol:0.4"));
        assertEquals("--blend 'toluene:0.5,ethanol:0.4': fractions must sum to 1, they sum to 0.900000", e.getMessage());
        e = assertThrows(InvalidInputException.class, () -> BlendSpec.parse("--blend", "toluene:abc,ethanol:1"));
        assertEquals("--blend", e.field());
        e = assertThrows(InvalidInputException.class, () -> BlendSpec.parse("--blend", "toluene:1.5,ethanol:-0.5"));
        assertEquals("--blend", e.field());
        assertThrows(InvalidInputException.class, () -> BlendSpec.parse("--blend", ""));
    }
}
