// gaskit from Go with cgo (Debian's golang-go, no modules to download).
//
// The C header is used as is; the compiler and linker flags come from the environment
// (CGO_CFLAGS="-I<prefix>/include", CGO_LDFLAGS="-L<libdir> -lgaskit"), or, with an installed
// gaskit, from pkg-config: put "#cgo pkg-config: gaskit" in the preamble instead.
// Asserts published values; exits non-zero on any mismatch.
package main

/*
#include <stdlib.h>
#include <gaskit/gaskit.h>
*/
import "C"

import (
	"fmt"
	"math"
	"os"
)

// statusError turns a gk_status into a Go error.
type statusError C.gk_status

func (s statusError) Error() string { return C.GoString(C.gk_status_string(C.gk_status(s))) }

func check(s C.gk_status) error {
	if s != C.GK_OK {
		return statusError(s)
	}
	return nil
}

// IdealMolarVolume in m3/mol from pressure in Pa and temperature in K.
func IdealMolarVolume(pa, k float64) (float64, error) {
	var vm C.gk_molar_volume
	err := check(C.gk_ideal_molar_volume(C.gk_pressure{pa: C.gk_real(pa)},
		C.gk_temperature{k: C.gk_real(k)}, &vm))
	return float64(vm.m3_per_mol), err
}

var failures int

func expectRel(what string, got, expected, rel float64) {
	e := math.Abs(got-expected) / math.Abs(expected)
	verdict := "ok"
	if e > rel {
		verdict = "FAILED"
		failures++
	}
	fmt.Printf("%-56s %.10g (published %.10g, rel. error %.1e) %s\n", what, got, expected, e, verdict)
}

func main() {
	isFloat := C.gk_build_flags()&C.GK_BUILD_FLOAT != 0
	rel := 1e-9
	if isFloat {
		rel = 2e-6
	}
	fmt.Printf("gaskit %s from Go (float build: %v)\n", C.GoString(C.gk_version()), isFloat)

	// CODATA 2018: ideal-gas molar volume at 273.15 K and 101.325 kPa.
	vm, err := IdealMolarVolume(101325, 273.15)
	if err != nil {
		fmt.Println("gk_ideal_molar_volume:", err)
		failures++
	}
	expectRel("ideal molar volume at 273.15 K, 101.325 kPa (m3/mol)", vm, 22.41396954e-3, rel)
	if _, err := IdealMolarVolume(101325, math.Inf(1)); err == nil {
		fmt.Println("infinite temperature accepted: FAILED")
		failures++
	} else {
		fmt.Println("infinite temperature rejected:", err)
	}

	// Batch over Go slices (C memory is not needed: the slices hold no Go pointers).
	// ISO 2533 sea level: 1.2250 kg/m3 (R* vs CODATA R: about 2e-5; rounded figure).
	p := []C.gk_real{101325, 101325, -5}
	t := []C.gk_real{288.15, 288.15, 288.15}
	rho := make([]C.gk_real, len(p))
	st := make([]C.gk_status, len(p))
	ok := C.gk_ideal_density_batch(C.size_t(len(p)), &p[0], &t[0],
		C.gk_molar_mass{kg_per_mol: 0.0289644}, &rho[0], &st[0])
	expectRel("batch: air at ISO 2533 sea level (kg/m3)", float64(rho[0]), 1.2250, 1e-4)
	if ok != 2 || st[2] != C.GK_ERR_DOMAIN || !math.IsNaN(float64(rho[2])) {
		fmt.Println("batch: bad element not reported: FAILED")
		failures++
	}

	if failures > 0 {
		fmt.Printf("%d check(s) FAILED\n", failures)
		os.Exit(1)
	}
	fmt.Println("all checks passed")
}
