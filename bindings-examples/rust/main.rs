//! gaskit from Rust with plain `extern "C"` declarations (no crates, no bindgen).
//!
//! The quantity structs are `#[repr(C)]` mirrors of the C ones; gk_status is read as i32 (a C
//! enum is int-sized on the hosted ABIs). This example binds the double build and checks that
//! with gk_build_flags first. Asserts published values; exits non-zero on any mismatch.
//! Build: rustc --edition 2021 main.rs -L <dir of libgaskit.so> -l gaskit

use std::ffi::CStr;
use std::os::raw::{c_char, c_int, c_uint};

type GkReal = f64; // gk_real of the double build
type GkStatus = c_int;
const GK_OK: GkStatus = 0;
const GK_ERR_DOMAIN: GkStatus = 2;
const GK_BUILD_FLOAT: c_uint = 0x1;

#[repr(C)]
#[derive(Clone, Copy)]
struct GkPressure { pa: GkReal }
#[repr(C)]
#[derive(Clone, Copy)]
struct GkTemperature { k: GkReal }
#[repr(C)]
#[derive(Clone, Copy)]
struct GkMolarVolume { m3_per_mol: GkReal }
#[repr(C)]
#[derive(Clone, Copy)]
struct GkMolarMass { kg_per_mol: GkReal }

#[link(name = "gaskit")]
extern "C" {
    fn gk_version() -> *const c_char;
    fn gk_build_flags() -> c_uint;
    fn gk_status_string(status: GkStatus) -> *const c_char;
    fn gk_ideal_molar_volume(p: GkPressure, t: GkTemperature, out: *mut GkMolarVolume) -> GkStatus;
    fn gk_ideal_density_batch(count: usize, p_pa: *const GkReal, t_k: *const GkReal, m: GkMolarMass,
                              out_kg_per_m3: *mut GkReal, status_out: *mut GkStatus) -> usize;
}

fn status_text(s: GkStatus) -> String {
    // gk_status_string never returns NULL and its text is static.
    unsafe { CStr::from_ptr(gk_status_string(s)) }.to_string_lossy().into_owned()
}

/// Safe wrapper: a Result instead of a status and an out-pointer.
fn ideal_molar_volume(p: GkPressure, t: GkTemperature) -> Result<GkMolarVolume, String> {
    let mut vm = GkMolarVolume { m3_per_mol: 0.0 };
    let s = unsafe { gk_ideal_molar_volume(p, t, &mut vm) };
    if s == GK_OK { Ok(vm) } else { Err(status_text(s)) }
}

fn check(failures: &mut u32, what: &str, got: f64, expected: f64, rel: f64) {
    let err = ((got - expected) / expected).abs();
    let ok = err <= rel;
    println!("{:<56} {:.10e} (published {:.10e}, rel. error {:.1e}) {}", what, got, expected, err,
             if ok { "ok" } else { "FAILED" });
    if !ok { *failures += 1; }
}

fn main() {
    let version = unsafe { CStr::from_ptr(gk_version()) }.to_string_lossy().into_owned();
    if unsafe { gk_build_flags() } & GK_BUILD_FLOAT != 0 {
        eprintln!("gaskit {} is a float build; this example binds gk_real as f64", version);
        std::process::exit(2);
    }
    println!("gaskit {} from Rust", version);
    let mut failures = 0u32;

    // CODATA 2018: ideal-gas molar volume at 273.15 K and 101.325 kPa (9 printed digits).
    match ideal_molar_volume(GkPressure { pa: 101325.0 }, GkTemperature { k: 273.15 }) {
        Ok(vm) => check(&mut failures, "ideal molar volume at 273.15 K, 101.325 kPa (m3/mol)",
                        vm.m3_per_mol, 22.41396954e-3, 1e-9),
        Err(e) => { println!("gk_ideal_molar_volume failed: {}", e); failures += 1; }
    }
    match ideal_molar_volume(GkPressure { pa: 0.0 }, GkTemperature { k: 273.15 }) {
        Ok(_) => { println!("zero pressure accepted: FAILED"); failures += 1; }
        Err(e) => println!("zero pressure rejected: {}", e),
    }

    // Batch over slices. ISO 2533 sea level: 1.2250 kg/m3 (R* vs CODATA R: about 2e-5).
    let p = [101325.0, 101325.0, f64::NAN];
    let t = [288.15, 288.15, 288.15];
    let mut rho = [0.0f64; 3];
    let mut st = [GK_OK; 3];
    let ok = unsafe {
        gk_ideal_density_batch(p.len(), p.as_ptr(), t.as_ptr(), GkMolarMass { kg_per_mol: 0.0289644 },
                               rho.as_mut_ptr(), st.as_mut_ptr())
    };
    check(&mut failures, "batch: air at ISO 2533 sea level (kg/m3)", rho[0], 1.2250, 1e-4);
    if ok != 2 || st[2] != GK_ERR_DOMAIN || !rho[2].is_nan() {
        println!("batch: bad element not reported: FAILED");
        failures += 1;
    }

    if failures > 0 {
        println!("{} check(s) FAILED", failures);
        std::process::exit(1);
    }
    println!("all checks passed");
}
