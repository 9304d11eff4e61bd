#!/usr/bin/env python3
"""Independent reference values for the ideal-limit cycle test (Blockwise).

The closed-form ideal turbofan with separate exhausts (Mattingly, Elements
of Propulsion, 2nd ed., parametric cycle analysis of ideal engines, the ideal
turbofan: specific thrust, fuel/air
ratio, TSFC, thermal, propulsive and overall efficiencies), evaluated with
numpy for the fixture fixtures/cycle/ideal-turbofan.cycle.json: Mach 0.8 at
35,000 ft ISA, bypass ratio 6, fan pressure ratio 1.6, overall pressure ratio
30 (fan included), Tt4 1,600 K, gamma 1.4, cp 1004.5 J/(kg K),
h_PR 42.8 MJ/kg, total airflow 100 kg/s. The textbook form neglects the
fuel's mass in the turbine and core nozzle.

Ambient temperature from the U.S. Standard Atmosphere 1976 troposphere
(NOAA-S/T 76-1562): T = 288.15 K - 6.5 K/km * H, H the geopotential pressure
altitude (35,000 ft = 10,668 m).
Run:  python3 test/reference/cycleIdealReference.py > test/reference/cycleIdealReference.json
"""
import json
import numpy as np

G = 1.4
CP = 1004.5
R = CP * (G - 1) / G
H_PR = 42.8e6
ALPHA = 6.0
PI_F = 1.6
PI_C = 30.0
TT4 = 1600.0
M0 = 0.8
AIRFLOW = 100.0
H_M = 35000 * 0.3048
T0 = 288.15 - 0.0065 * H_M

a0 = np.sqrt(G * R * T0)
tau_r = 1 + (G - 1) / 2 * M0**2
tau_lambda = TT4 / T0
tau_c = PI_C ** ((G - 1) / G)
tau_f = PI_F ** ((G - 1) / G)
v9_a0 = np.sqrt(2 / (G - 1) * (tau_lambda - tau_r * (tau_c - 1 + ALPHA * (tau_f - 1)) - tau_lambda / (tau_r * tau_c)))
v19_a0 = np.sqrt(2 / (G - 1) * (tau_r * tau_f - 1))
specific_thrust = a0 / (1 + ALPHA) * (v9_a0 - M0 + ALPHA * (v19_a0 - M0))
f = CP * T0 * (tau_lambda - tau_r * tau_c) / H_PR
tsfc = f / ((1 + ALPHA) * specific_thrust)
eta_t = 1 - 1 / (tau_r * tau_c)
eta_p = 2 * M0 * (v9_a0 - M0 + ALPHA * (v19_a0 - M0)) / (v9_a0**2 - M0**2 + ALPHA * (v19_a0**2 - M0**2))
core_flow = AIRFLOW / (1 + ALPHA)

out = {
    "source": "Mattingly, Elements of Propulsion, 2nd ed., parametric cycle analysis of ideal engines, ideal turbofan closed form (numpy)",
    "t0_K": T0,
    "a0_m_s": a0,
    "coreExitVelocity_m_s": v9_a0 * a0,
    "bypassExitVelocity_m_s": v19_a0 * a0,
    "specificThrust_N_s_kg": specific_thrust,
    "thrust_N": specific_thrust * AIRFLOW,
    "fuelAirRatio": f,
    "fuelFlow_kg_s": f * core_flow,
    "tsfc_kg_N_s": tsfc,
    "thermalEfficiency": eta_t,
    "propulsiveEfficiency": eta_p,
    "overallEfficiency": eta_t * eta_p,
}
print(json.dumps(out, indent=2))
