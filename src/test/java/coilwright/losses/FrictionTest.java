package coilwright.losses;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

class FrictionTest {

    @Test
    @DisplayName("SKF simplified model: deep groove ball bearing, d = 25 mm, P = 1 kN: M = 0.5 x 0.0015 x 1000 x 0.025 = 0.01875 N m")
    void skf_simplified_model_by_hand() {
        // source: SKF General Catalogue, "Friction": M = 0.5 mu P d, mu = 0.0015 for deep groove ball bearings
        assertEquals(0.01875, new Bearing(BearingType.DEEP_GROOVE_BALL, 0.025, 1000, 0).frictionTorqueNm(), 1e-12);
    }

    @Test
    void bearings_add_and_break_away_is_twice_running() {
        ShaftFriction f = ShaftFriction.ofBearings(List.of(new Bearing(BearingType.DEEP_GROOVE_BALL, 0.025, 1000, 0.03),
                new Bearing(BearingType.SPHERICAL_ROLLER, 0.03, 2000, 0)));
        double m = 0.01875 + 0.03 + 0.5 * 0.0018 * 2000 * 0.03;
        assertEquals(m, f.runningTorqueNm(), 1e-12);
        assertEquals(2 * m, f.breakawayTorqueNm(), 1e-12);
        assertEquals(m * 300 * Math.PI / 30, f.powerW(300), 1e-12);
    }

    @Test
    void a_user_torque_is_kept_and_break_away_never_below_running() {
        ShaftFriction f = ShaftFriction.userTorque(0.2, 0.1);
        assertEquals(0.2, f.breakawayTorqueNm());
        assertEquals("user value", f.source());
        assertThrows(InvalidInputException.class, () -> new ShaftFriction(0.3, 0.2, "x"));
        assertThrows(InvalidInputException.class, () -> new Bearing(null, 0.0, -1, 0));
    }
}
