package io.geotick.geodesy.angle;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import io.geotick.geodesy.InvalidCoordinateException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class AnglesTest {
    private static final double G = 51 + 28 / 60.0 + 38.5 / 3600; // 51°28'38.5"

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "51°28'38.5\"N        | 51.47736111111111",
        "51 28 38.5 N         | 51.47736111111111",
        "N51d28m38.5s         | 51.47736111111111",
        "N 51° 28′ 38.5″      | 51.47736111111111",
        "51°28’38.5”N         | 51.47736111111111",
        "51º28'38.5''N        | 51.47736111111111",
        "51:28:38.5           | 51.47736111111111",
        "  51°28'38.5\" N     | 51.47736111111111",
        "51°28'38.5\"S        | -51.47736111111111",
        "-51 28 38.5          | -51.47736111111111",
        "−51 28 38.5          | -51.47736111111111",
        "S51d28m38.5s         | -51.47736111111111",
        "51°28.641666666667'N | 51.477361111111115",
        "51 28.5              | 51.475",
        "-0.0014              | -0.0014",
        "+12.5                | 12.5",
        "12.5°                | 12.5",
        "12.5 deg             | 12.5",
        "90                   | 90.0",
        "90°00'00\"S          | -90.0",
        "-90                  | -90.0",
        "0                    | 0.0",
        "-0                   | 0.0",
        "0°00'00.0\"S         | 0.0",
        "45°                  | 45.0",
        "45°30'               | 45.5",
        "45d 30m              | 45.5",
        "7°05'03\"N           | 7.084166666666667",
        "89°59'59.999999\"N   | 89.99999999972222"})
    void parsesValidLatitudes(String text, double expected) {
        assertThat(Angles.parseLatitude(text)).isCloseTo(expected, within(2e-15));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "0°00'05.3\"W       | -0.0014722222222222222",
        "W 0 0 5.3          | -0.0014722222222222222",
        "2°07'46.380\"E     | 2.1295500000000000",
        "E2d7m46.38s        | 2.1295500000000000",
        "-180               | -180.0",
        "180°W              | -180.0",
        "359.9999           | 359.9999",
        "360                | 360.0",
        "200 E              | 200.0",
        "120.25             | 120.25",
        "179°59'59.9\"W     | -179.99997222222223"})
    void parsesValidLongitudes(String text, double expected) {
        assertThat(Angles.parseLongitude(text)).isCloseTo(expected, within(3e-14));
    }

    @Test
    void theParsedValueIsTheDoubleNearestTheDecimalValueWritten() {
        // d + m/60 + s/3600 evaluated in 50-digit decimal and rounded once.
        MathContext mc = new MathContext(50);
        BigDecimal exact = new BigDecimal(51).add(new BigDecimal(28).divide(new BigDecimal(60), mc))
            .add(new BigDecimal("38.5").divide(new BigDecimal(3600), mc));
        assertThat(Angles.parseLatitude("51°28'38.5\"N")).isEqualTo(exact.doubleValue());
        assertThat(Angles.parseLatitude("51°28'38.5\"N")).isCloseTo(G, within(1e-14));
        assertThat(Angles.parseLatitude("-0.0014")).isEqualTo(-0.0014);
        assertThat(Angles.parseLatitude("0.1")).isEqualTo(0.1);
        // No negative zero.
        assertThat(Double.doubleToRawLongBits(Angles.parseLatitude("-0.000"))).isEqualTo(0L);
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "   ", "NaN", "nan", "-NaN", "Infinity", "-Infinity", "inf", "∞", "abc", "51.5x",
        "51,5", "1e5", "5.1e1", "51°60'00\"N", "51°28'60\"N", "51°28'60.0\"N", "51°75'N", "51.5°30'",
        "51°28.5'10\"", "90°00'00.001\"N", "90.0000001", "-90.5", "91", "100", "N51S", "N 51 N", "-51 N",
        "+51S", "51 E", "51°28'38.5\"W", "51°°28'", "51 28 38 12", "51--28", "--51", ". 5", ".5", "51.",
        "0051", "51 n", "51°28'38.5\"n", "51d28m38.5S S", "51 : 28", "°51", "51'28\"", "1/2"})
    void rejectsInvalidLatitudesNamingTheText(String text) {
        assertThatThrownBy(() -> Angles.parseLatitude(text)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("latitude '" + text + "'");
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "NaN", "-Infinity", "12 N", "S 12", "-180.0001", "-180.5", "181 W", "360.5",
        "361", "0°60'W", "0°00'60\"W", "1000", "12 34 56 78", "E-12"})
    void rejectsInvalidLongitudesNamingTheText(String text) {
        assertThatThrownBy(() -> Angles.parseLongitude(text)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("longitude '" + text + "'");
    }

    @Test
    void explainsWhyTextIsRejected() {
        assertThatThrownBy(() -> Angles.parseLatitude("NaN")).hasMessageContaining("not a finite number");
        assertThatThrownBy(() -> Angles.parseLatitude("")).hasMessageContaining("empty");
        assertThatThrownBy(() -> Angles.parseLatitude("12 E")).hasMessageContaining("'E'")
            .hasMessageContaining("N/S");
        assertThatThrownBy(() -> Angles.parseLongitude("12 N")).hasMessageContaining("E/W");
        assertThatThrownBy(() -> Angles.parseLatitude("12°60'")).hasMessageContaining("minutes 60");
        assertThatThrownBy(() -> Angles.parseLatitude("12°10'61\"")).hasMessageContaining("seconds 61");
        assertThatThrownBy(() -> Angles.parseLatitude("91")).hasMessageContaining("[-90°, 90°]");
        assertThatThrownBy(() -> Angles.parseLongitude("-181")).hasMessageContaining("[-180°, 360°]");
        assertThatThrownBy(() -> Angles.parseLatitude("-12 S")).hasMessageContaining("sign and a hemisphere");
        assertThatThrownBy(() -> Angles.parseLatitude(null)).isInstanceOf(NullPointerException.class);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "51.47736111111111  | 1 | 51°28'38.5\"N",
        "-51.47736111111111 | 1 | 51°28'38.5\"S",
        "51.47736111111111  | 3 | 51°28'38.500\"N",
        "51.4774            | 0 | 51°28'39\"N",
        "0                  | 2 | 0°00'00.00\"N",
        "-1e-12             | 2 | 0°00'00.00\"N",
        "-1e-3              | 1 | 0°00'03.6\"S",
        "90                 | 0 | 90°00'00\"N",
        "-90                | 4 | 90°00'00.0000\"S",
        "7.084166666666667  | 0 | 7°05'03\"N"})
    void formatsLatitudes(double value, int decimals, String expected) {
        assertThat(Angles.formatLatitude(value, decimals)).isEqualTo(expected);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "-0.0014722222222222222 | 1 | 0°00'05.3\"W",
        "2.12955                | 3 | 2°07'46.380\"E",
        "-180                   | 0 | 180°00'00\"W",
        "360                    | 0 | 360°00'00\"E",
        "200                    | 1 | 200°00'00.0\"E"})
    void formatsLongitudes(double value, int decimals, String expected) {
        assertThat(Angles.formatLongitude(value, decimals)).isEqualTo(expected);
    }

    @Test
    void roundingCarriesIntoMinutesAndDegrees() {
        // 51°28'59.99951" rounds up at three decimals: the seconds carry into the minutes.
        double v = 51 + 28 / 60.0 + 59.99951 / 3600;
        assertThat(Angles.formatLatitude(v, 3)).isEqualTo("51°29'00.000\"N");
        assertThat(Angles.formatLatitude(v, 5)).isEqualTo("51°28'59.99951\"N");
        // 51°59'59.96" at one decimal: carries through the minutes into the degrees.
        double w = 51 + 59 / 60.0 + 59.96 / 3600;
        assertThat(Angles.formatLatitude(w, 1)).isEqualTo("52°00'00.0\"N");
        assertThat(Angles.formatLatitude(-w, 0)).isEqualTo("52°00'00\"S");
        // ... and a carry that reaches 180°.
        assertThat(Angles.formatLongitude(-(179 + 59 / 60.0 + 59.9996 / 3600), 3)).isEqualTo("180°00'00.000\"W");
    }

    @Test
    void formatsDecimalDegrees() {
        assertThat(Angles.formatDecimal(-0.0014, 6)).isEqualTo("-0.001400");
        assertThat(Angles.formatDecimal(51.47736111111111, 9)).isEqualTo("51.477361111");
        assertThat(Angles.formatDecimal(-1e-9, 3)).isEqualTo("0.000");
        assertThat(Angles.formatDecimal(1e-7, 12)).isEqualTo("0.000000100000");
        assertThat(Angles.formatDecimal(12, 0)).isEqualTo("12");
        assertThatThrownBy(() -> Angles.formatDecimal(Double.NaN, 3)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("NaN");
    }

    @Test
    void formattingRejectsBadValuesAndDecimals() {
        assertThatThrownBy(() -> Angles.formatLatitude(90.0000001, 1)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("90.0000001");
        assertThatThrownBy(() -> Angles.formatLatitude(Double.NaN, 1)).isInstanceOf(InvalidCoordinateException.class);
        assertThatThrownBy(() -> Angles.formatLongitude(Double.NEGATIVE_INFINITY, 1))
            .isInstanceOf(InvalidCoordinateException.class);
        assertThatThrownBy(() -> Angles.formatLongitude(-180.5, 1)).isInstanceOf(InvalidCoordinateException.class);
        assertThatThrownBy(() -> Angles.formatLatitude(10, -1)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> Angles.formatLatitude(10, Angles.MAX_DECIMALS + 1))
            .isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void formattedValuesParseBackWithinHalfAUnitOfTheLastDigit() {
        Random rnd = new Random(7L);
        for (int i = 0; i < 2000; i++) {
            double lat = -90 + 180 * rnd.nextDouble();
            double lon = -180 + 540 * rnd.nextDouble();
            int decimals = rnd.nextInt(Angles.MAX_DECIMALS + 1);
            double halfUnit = 0.5 * Math.pow(10, -decimals) / 3600;
            double lat2 = Angles.parseLatitude(Angles.formatLatitude(lat, decimals));
            double lon2 = Angles.parseLongitude(Angles.formatLongitude(lon, decimals));
            assertThat(Math.abs(lat2 - lat)).isLessThanOrEqualTo(halfUnit + Math.ulp(90.0));
            assertThat(Math.abs(lon2 - lon)).isLessThanOrEqualTo(halfUnit + Math.ulp(360.0));
            double dec = Angles.parseLatitude(Angles.formatDecimal(lat, 12));
            assertThat(Math.abs(dec - lat)).isLessThanOrEqualTo(0.5e-12 + Math.ulp(90.0));
        }
    }
}
