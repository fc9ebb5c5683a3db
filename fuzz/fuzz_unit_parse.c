/* fuzz_unit_parse.c - gk_unit_parse on arbitrary text.
   GK_OK: a unit inside the enum whose symbol parses back to the same unit.
   Otherwise: GK_ERR_NOT_FOUND / GK_ERR_ARGUMENT / GK_ERR_PARSE and *out untouched. */
#include "fuzz_common.h"

int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size) {
    char *text = fz_string(data, size);
    gk_unit unit = GK_UNIT_COUNT; /* sentinel: not a unit */
    gk_status s = gk_unit_parse(text, &unit);
    FZ_STATUS(s);
    if (s == GK_OK) {
        FZ_REQUIRE((int)unit >= 0 && (int)unit < (int)GK_UNIT_COUNT);
        const char *symbol = gk_unit_symbol(unit);
        FZ_REQUIRE(symbol != NULL && symbol[0] != '\0');
        gk_unit again = GK_UNIT_COUNT;
        FZ_REQUIRE(gk_unit_parse(symbol, &again) == GK_OK && again == unit);
    } else {
        FZ_REQUIRE(unit == GK_UNIT_COUNT);
    }
    free(text);
    return 0;
}
