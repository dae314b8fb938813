#!/usr/bin/env bash
# Renders the real editor window on the samples, offscreen, into docs/images/ for the user
# guide. Run after a build: bash docs/make-screenshots.sh
set -euo pipefail
cd "$(dirname "$0")/.."
bin=.build/release/app/lineward
export QT_QPA_PLATFORM=offscreen
export XDG_DATA_HOME="$(mktemp -d)"   # a clean settings/recovery folder for the shots
"$bin" samples/kestrel-mill-mcc1.lineward --screenshot docs/images/editor-clean-sample.png
"$bin" samples/kestrel-mill-mcc1-review.lineward --screenshot docs/images/editor-review-sample.png
# Import Load List: the preview dialog, from the ui test that drives it with real events.
LINEWARD_SHOT_DIR=docs/images .build/release/tests/ui_tests \
    --gtest_filter='ImportLoadList.PreviewShowsBucketsAndRefusalsAndImportIsOneUndoableEdit' >/dev/null
rm -f docs/images/import-load-list-sheet.png
# Add Bucket (a value changed, its findings) and the Inspector editing two cables at once.
LINEWARD_SHOT_DIR=docs/images .build/release/tests/ui_tests \
    --gtest_filter='AddBucket.AChangedValueIsCheckedShowsItsFindingsAndIsPlaced:MultiEdit.RubberBandOverCablesThenOneLengthForAllIsOneUndoableEdit' >/dev/null
echo "wrote docs/images/editor-clean-sample.png, editor-review-sample.png, import-load-list.png,"
echo "add-bucket.png and multi-edit.png"
