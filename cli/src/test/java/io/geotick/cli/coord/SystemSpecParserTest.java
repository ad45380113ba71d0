package io.geotick.cli.coord;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.geotick.cli.UserInputException;
import org.junit.jupiter.api.Test;

/** SYS text parsing: kinds, origins, canonical text, and errors that quote the text. */
class SystemSpecParserTest {
    @Test
    void plainKinds() {
        assertThat(CoordinateSystemSpec.parse("geodetic").kind()).isEqualTo(SystemKind.GEODETIC);
        assertThat(CoordinateSystemSpec.parse("ECEF").kind()).isEqualTo(SystemKind.ECEF);
        assertThat(CoordinateSystemSpec.parse(" ecef ").origin()).isEmpty();
    }

    @Test
    void localKindsCarryTheirOrigin() {
        CoordinateSystemSpec s = CoordinateSystemSpec.parse("NED:-33.5, 151.25 ,-12.0");
        assertThat(s.kind()).isEqualTo(SystemKind.NED);
        assertThat(s.origin()).hasValueSatisfying(o -> {
            assertThat(o.latitude()).isEqualTo(-33.5);
            assertThat(o.longitude()).isEqualTo(151.25);
            assertThat(o.height()).isEqualTo(-12.0);
        });
        assertThat(s.text()).isEqualTo("ned:-33.5,151.25,-12");
        assertThat(CoordinateSystemSpec.parse("aer:0,0,0").text()).isEqualTo("aer:0,0,0");
        assertThat(CoordinateSystemSpec.parse("enu:1e-7,-0,1E3").text()).isEqualTo("enu:0.0000001,0,1000");
    }

    @Test
    void errorsQuoteTheText() {
        assertThatThrownBy(() -> CoordinateSystemSpec.parse("polar"))
            .isInstanceOf(UserInputException.class)
            .hasMessage("unknown coordinate system 'polar'; known: geodetic, ecef, enu:LAT,LON,H, ned:LAT,LON,H, "
                + "aer:LAT,LON,H");
        assertThatThrownBy(() -> CoordinateSystemSpec.parse("")).hasMessageContaining("empty");
        assertThatThrownBy(() -> CoordinateSystemSpec.parse("aer")).hasMessageContaining("'aer' needs its origin");
        assertThatThrownBy(() -> CoordinateSystemSpec.parse("ecef:1,2,3")).hasMessageContaining("takes no parameters");
        assertThatThrownBy(() -> CoordinateSystemSpec.parse("enu:1,2,3,4")).hasMessageContaining("got 4");
        assertThatThrownBy(() -> CoordinateSystemSpec.parse("enu:1,,3"))
            .hasMessageContaining("'enu:1,,3'").hasMessageContaining("origin longitude is empty");
        assertThatThrownBy(() -> CoordinateSystemSpec.parse("enu:1,2,NaN")).hasMessageContaining("origin height 'NaN'");
        assertThatThrownBy(() -> CoordinateSystemSpec.parse("enu:-90.5,2,3"))
            .isInstanceOf(UserInputException.class).hasMessageContaining("origin latitude -90.5");
        assertThatThrownBy(() -> CoordinateSystemSpec.parse("enu:1,400,3")).hasMessageContaining("origin longitude 400");
        assertThatThrownBy(() -> CoordinateSystemSpec.parse("geodetic@ITRF2020"))
            .hasMessageContaining("'@ITRF2020'").hasMessageContaining("not supported yet");
    }
}
