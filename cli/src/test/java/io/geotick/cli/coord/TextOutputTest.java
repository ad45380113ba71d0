package io.geotick.cli.coord;

import static org.assertj.core.api.Assertions.assertThat;

import io.geotick.transforms.epsg.LinearUnit;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Text rendering details: rounding, negative zero, alignment. */
class TextOutputTest {
    @Test
    void roundsToTheUnitsDecimalsAndNeverShowsNegativeZero() {
        assertThat(Unit.METRE.formatText(-0.0000004)).isEqualTo("0.000000");
        assertThat(Unit.METRE.formatText(-0.0000006)).isEqualTo("-0.000001");
        assertThat(Unit.DEGREE.formatText(-0.0)).isEqualTo("0.00000000000");
        assertThat(Unit.DEGREE.formatText(359.999999999996)).isEqualTo("360.00000000000");
    }

    @Test
    void gridUnitsShowTheirSymbolAndAtMostAMicrometrePerDigit() {
        assertThat(Unit.of(LinearUnit.METRE)).isSameAs(Unit.METRE);
        Unit ftUs = Unit.of(LinearUnit.US_SURVEY_FOOT);
        assertThat(ftUs.symbol()).isEqualTo("ftUS");
        assertThat(ftUs.textDecimals()).isEqualTo(6);
        assertThat(ftUs.formatText(984250.0000000003)).isEqualTo("984250.000000");
        assertThat(Unit.of(LinearUnit.INTERNATIONAL_FOOT).symbol()).isEqualTo("ft");
        // A chain of 20.1 m shows 8 decimals (0.2 µm); a unit just over a metre 7.
        assertThat(Unit.of(LinearUnit.ofDecimal("chain", "ch", "20.1168", "test")).textDecimals()).isEqualTo(8);
        assertThat(Unit.of(LinearUnit.ofDecimal("legal metre", "GLM", "1.0000135965", "test")).textDecimals())
            .isEqualTo(7);
    }

    @Test
    void azimuthThatRoundsUpTo360ShowsAsZero() {
        Axis az = SystemKind.AER.axes().get(0);
        assertThat(az.formatText(359.999999999996)).isEqualTo("0.00000000000");
        assertThat(az.formatText(359.999999999994)).isEqualTo("359.99999999999");
        assertThat(SystemKind.GEODETIC.axes().get(1).formatText(359.999999999996)).isEqualTo("360.00000000000");
    }

    @Test
    void rendersOneLabelledLinePerValue() {
        ConvertedPoint p = new ConvertedPoint(CoordinateSystemSpec.parse("aer:10,20,30"), "WGS 84", List.of(
            new OutputField(SystemKind.AER.axes().get(0), 5.25),
            new OutputField(SystemKind.AER.axes().get(1), -0.0),
            new OutputField(SystemKind.AER.axes().get(2), 20200000.5)));
        assertThat(TextOutput.render(p).lines()).containsExactly(
            "system     aer:10,20,30",
            "ellipsoid  WGS 84",
            "azimuth           5.25000000000 deg",
            "elevation         0.00000000000 deg",
            "range      20200000.500000 m");
    }
}
