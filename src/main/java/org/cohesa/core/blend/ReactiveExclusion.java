package org.cohesa.core.blend;

import java.util.EnumSet;
import java.util.Set;
import java.util.stream.Collectors;
import org.cohesa.core.solvent.Solvent;

/**
 * Which reactive solvents a search leaves out, and whether they come from the user's choice or from the liquid being
 * replaced: the one rule the command line ({@code replace}, {@code --exclude-reactive}) and the desktop's limits form share.
 *
 * <p>Flags the user named decide, and an empty choice means none at all (the command line's {@code --exclude-reactive none},
 * the desktop's switch turned off). When the user named nothing, a replacement ranked by the replaced liquid's own process use
 * leaves out every reactivity that liquid lacks ({@link ReactiveFlag#newTo}: a substitute does the original's job in the same
 * chemistry; docs/methods.md); any other search leaves out none.
 *
 * @param flags    the flags to leave out (never null)
 * @param lackedBy the replaced liquid the flags come from, or null when they are the user's choice (or there are none)
 */
public record ReactiveExclusion(Set<ReactiveFlag> flags, Solvent lackedBy) {

    public ReactiveExclusion {
        flags = flags.isEmpty() ? Set.of() : Set.copyOf(EnumSet.copyOf(flags));
        if (lackedBy != null && flags.isEmpty()) {
            throw new IllegalArgumentException("a replaced liquid that lacks no reactivity leaves nothing out");
        }
    }

    /**
     * @param named            the flags the user chose (empty: none), or null when the user chose nothing
     * @param replacedAsItself the liquid replaced when the search ranks by its own process use ("as the original"), else null
     */
    public static ReactiveExclusion of(Set<ReactiveFlag> named, Solvent replacedAsItself) {
        if (named != null) {
            return new ReactiveExclusion(named, null);
        }
        if (replacedAsItself == null) {
            return new ReactiveExclusion(Set.of(), null);
        }
        Set<ReactiveFlag> lacked = ReactiveFlag.newTo(replacedAsItself);
        return new ReactiveExclusion(lacked, lacked.isEmpty() ? null : replacedAsItself);
    }

    /** True when the flags come from the replaced liquid, not from the user's choice. */
    public boolean fromReplaced() {
        return lackedBy != null;
    }

    /** The constraints with exactly these reactive solvents left out. */
    public BlendConstraints applyTo(BlendConstraints c) {
        return c.with(c.more().withReactive(flags));
    }

    /** "dichloromethane is no carboxylic acid, amine or pyridine base, …" (in the flags' order); empty when the flags are the user's. */
    public String lack() {
        if (lackedBy == null) {
            return "";
        }
        return lackedBy.name() + " is no " + EnumSet.copyOf(flags).stream().map(ReactiveFlag::label).collect(Collectors.joining(", "));
    }
}
