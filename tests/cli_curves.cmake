# lineward-cli curves with no display: each picture type is written and looks like one.
foreach(ext svg png pdf)
  file(REMOVE ${OUT}/p102.${ext})
  execute_process(COMMAND ${CLI} curves ${SAMPLES}/kestrel-mill-mcc1.lineward --part P-102 --${ext} ${OUT}/p102.${ext}
                  RESULT_VARIABLE rc OUTPUT_VARIABLE out ERROR_VARIABLE err)
  if(NOT rc EQUAL 0 OR NOT EXISTS ${OUT}/p102.${ext})
    message(FATAL_ERROR "curves --${ext} failed (${rc}): ${out} ${err}")
  endif()
  file(SIZE ${OUT}/p102.${ext} size)
  if(size LESS 2000)
    message(FATAL_ERROR "curves --${ext} wrote only ${size} bytes")
  endif()
endforeach()
file(READ ${OUT}/p102.svg svg)
if(NOT svg MATCHES "<svg" OR NOT svg MATCHES "OL-102" OR NOT svg MATCHES "CB-F1")
  message(FATAL_ERROR "the SVG lacks the legend's part tags")
endif()
execute_process(COMMAND ${CLI} curves ${SAMPLES}/kestrel-mill-mcc1.lineward --part NOPE --png ${OUT}/x.png RESULT_VARIABLE rc)
if(NOT rc EQUAL 2)
  message(FATAL_ERROR "an unknown tag must exit 2, got ${rc}")
endif()

# export, headless: PDF, SVG and CSV in one call; a bad paper name exits 2.
file(REMOVE_RECURSE ${OUT}/export)
execute_process(COMMAND ${CLI} export ${SAMPLES}/kestrel-mill-mcc1-review.lineward --pdf ${OUT}/export/review.pdf
                        --svg ${OUT}/export/review.svg --csv ${OUT}/export/csv --paper a3
                RESULT_VARIABLE rc OUTPUT_VARIABLE out ERROR_VARIABLE err)
file(MAKE_DIRECTORY ${OUT}/export)
if(NOT rc EQUAL 0 OR NOT EXISTS ${OUT}/export/review.pdf OR NOT EXISTS ${OUT}/export/review.svg
   OR NOT EXISTS ${OUT}/export/csv/motors.csv)
  message(FATAL_ERROR "export failed (${rc}): ${out} ${err}")
endif()
# Revision flags: the issued revision against the colleague's earlier layout flags each part
# added or changed since (23: 1 added, 22 changed, as `compare` lists them), and the revision
# table says so on the one-line sheet; a previous revision that cannot be read exits 2.
execute_process(COMMAND ${CLI} export ${SAMPLES}/kestrel-mill-mcc1.lineward --pdf ${OUT}/export/revised.pdf
                        --since ${SAMPLES}/kestrel-mill-mcc1-review.lineward
                RESULT_VARIABLE rc OUTPUT_VARIABLE out ERROR_VARIABLE err)
if(NOT rc EQUAL 0 OR NOT out MATCHES "23 part\\(s\\) flagged as revised")
  message(FATAL_ERROR "export --since: (${rc}) ${out} ${err}")
endif()
execute_process(COMMAND pdftotext -f 1 -l 1 ${OUT}/export/revised.pdf - OUTPUT_VARIABLE page1 RESULT_VARIABLE rc)
if(NOT rc EQUAL 0 OR NOT page1 MATCHES "FLAG B: 23 PARTS")
  message(FATAL_ERROR "the one-line sheet lacks the revision flags' line:\n${page1}")
endif()
file(WRITE ${OUT}/export/broken.lineward "{\n  \"format\": \"lineward\",\n")
execute_process(COMMAND ${CLI} export ${SAMPLES}/kestrel-mill-mcc1.lineward --pdf ${OUT}/export/x.pdf
                        --since ${OUT}/export/broken.lineward RESULT_VARIABLE rc ERROR_VARIABLE err)
if(NOT rc EQUAL 2 OR NOT err MATCHES "broken.lineward:")
  message(FATAL_ERROR "an unreadable --since must exit 2 with its place, got ${rc}: ${err}")
endif()
execute_process(COMMAND ${CLI} export ${SAMPLES}/kestrel-mill-mcc1.lineward --pdf ${OUT}/x.pdf --paper b5 RESULT_VARIABLE rc)
if(NOT rc EQUAL 2)
  message(FATAL_ERROR "a bad paper must exit 2, got ${rc}")
endif()
