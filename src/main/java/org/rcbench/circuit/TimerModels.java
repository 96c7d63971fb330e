package org.rcbench.circuit;

/** Builds the model class for a spec's topology. */
public final class TimerModels {
    private TimerModels() {
    }

    /**
     * The model for {@code spec}. The spec must hold the parts its topology needs (the design reader
     * checks this and reports missing parts to the user); otherwise {@link IllegalArgumentException}.
     */
    public static TimerModel build(CircuitSpec spec) {
        for (Role r : spec.topology().requiredRoles()) {
            if (spec.withRole(r).isEmpty()) {
                throw new IllegalArgumentException(spec.topology().fileName() + " needs a part with role " + r.fileName());
            }
        }
        switch (spec.topology()) {
            case MONOSTABLE: return new MonostableModel(spec);
            case BISTABLE: return new BistableModel(spec);
            case ASTABLE: return new AstableModel(spec);
            case ASTABLE_ONE_DIODE: return new OneDiodeAstableModel(spec);
            case ASTABLE_TWO_DIODE: return new TwoDiodeAstableModel(spec);
            case OUTPUT_FED: return new OutputFedAstableModel(spec);
            case PWM_POT: return new PotPwmModel(spec);
            default: throw new IllegalArgumentException(spec.topology().name());
        }
    }
}
