#!/usr/bin/env bash
# Regenerates the example figures in docs/figures/ with phasewright-cli plot (headless).
#   docs/figures/make-examples.sh [path/to/phasewright-cli]   (default: build/app/phasewright-cli)
set -euo pipefail
here=$(cd "$(dirname "$0")" && pwd)
cli=${1:-$here/../../build/app/phasewright-cli}
cd "$here"

# Water in the freeze-drying window: chamber set point 13.33 Pa (100 mTorr), a collapse
# temperature of -35 degC, product and secondary-drying points from freeze-drying-points.csv.
"$cli" plot --substance water --points freeze-drying-points.csv \
    --guide "P=100 mTorr: chamber" --guide "T=-35 degC: collapse" \
    --title "Water: freeze-drying window" --t-unit degC --t-range -60 40 --p-range 1 10000 \
    --caution --width-mm 85 --dpi 300 --output water-freeze-drying.png
"$cli" plot --substance water --points freeze-drying-points.csv \
    --guide "P=100 mTorr: chamber" --guide "T=-35 degC: collapse" \
    --title "Water: freeze-drying window" --t-unit degC --t-range -60 40 --p-range 1 10000 \
    --caution --width-mm 85 --output water-freeze-drying.pdf
"$cli" plot --substance water --points freeze-drying-points.csv \
    --guide "P=100 mTorr: chamber" --guide "T=-35 degC: collapse" \
    --title "Water: freeze-drying window" --t-unit degC --t-range -60 40 --p-range 1 10000 \
    --caution --width-mm 85 --output water-freeze-drying.svg

# CO2 around its critical point on a linear pressure axis: supercritical drying at 10 MPa,
# venting along the 40 degC isotherm (FIELD-NOTES: 35-45 degC, 8-12 MPa).
"$cli" plot --substance CO2 --title "CO2 around its critical point" --t-unit degC --p-unit MPa \
    --t-range -60 60 --p-range 0.3 15 --linear-p --no-atmosphere \
    --guide "P=10 MPa: drying pressure" --guide "T=40 degC: vent isotherm" \
    --caution --width-mm 170 --dpi 300 --output co2-critical.png

# Two substances: CO2 and nitrogen, boundaries only (line styles differ in greyscale too).
"$cli" plot --substance CO2 --substance nitrogen --title "CO2 and nitrogen" \
    --t-range 50 330 --p-unit MPa --p-range 0.001 20 --no-regions \
    --width-mm 170 --dpi 300 --output co2-nitrogen-overlay.png
