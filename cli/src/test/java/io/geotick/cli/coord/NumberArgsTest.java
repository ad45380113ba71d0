package io.geotick.cli.coord;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.geotick.cli.UserInputException;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/** Strict number parsing: plain decimals in, everything else out with the argument named. */
class NumberArgsTest {
    @ParameterizedTest
    @CsvSource({"0, 0", "-33.9, -33.9", "+12, 12", "1., 1", ".5, 0.5", "-.5, -0.5", "6.4e6, 6400000",
        "1E-3, 0.001", "00012.50, 12.5", "1.7976931348623157e308, 1.7976931348623157e308"})
    void acceptsPlainDecimals(String text, double expected) {
        assertThat(NumberArgs.decimal("x", text)).isEqualTo(expected);
    }

    @ParameterizedTest
    @ValueSource(strings = {"NaN", "-NaN", "Infinity", "-Infinity", "0x1p3", "0X10", "1d", "2f", " 1", "1 ", "1,5",
        "1.2.3", "e5", "1e", "--1", "+-1", "abc", ".", "-", "１２"})
    void refusesEverythingElse(String text) {
        assertThatThrownBy(() -> NumberArgs.decimal("latitude", text))
            .isInstanceOf(UserInputException.class)
            .hasMessage("latitude '" + text + "' is not a number");
    }

    @ParameterizedTest
    @ValueSource(strings = {"1e309", "-2e308"})
    void refusesNumbersBeyondDouble(String text) {
        assertThatThrownBy(() -> NumberArgs.length("height", text)).hasMessage("height '" + text + "' is too large");
    }

    @ParameterizedTest
    @ValueSource(strings = {""})
    void refusesEmptyText(String text) {
        assertThatThrownBy(() -> NumberArgs.angle("azimuth", text)).hasMessage("azimuth is empty; a number is needed");
    }
}
