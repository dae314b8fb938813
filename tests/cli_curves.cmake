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
# added or changed since (25: 1 added, 24 changed, as `compare` lists them; the issued revision
# also lowered CB-MAIN's short-time pickup for arc flash and lengthened CB-F1's long-time delay
# for selectivity at the listing limits), and the revision
# table says so on the one-line sheet; a previous revision that cannot be read exits 2.
execute_process(COMMAND ${CLI} export ${SAMPLES}/kestrel-mill-mcc1.lineward --pdf ${OUT}/export/revised.pdf
                        --since ${SAMPLES}/kestrel-mill-mcc1-review.lineward
                RESULT_VARIABLE rc OUTPUT_VARIABLE out ERROR_VARIABLE err)
if(NOT rc EQUAL 0 OR NOT out MATCHES "25 part\\(s\\) flagged as revised")
  message(FATAL_ERROR "export --since: (${rc}) ${out} ${err}")
endif()
execute_process(COMMAND pdftotext -f 1 -l 1 ${OUT}/export/revised.pdf - OUTPUT_VARIABLE page1 RESULT_VARIABLE rc)
if(NOT rc EQUAL 0 OR NOT page1 MATCHES "FLAG B: 25 PARTS")
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

# labels, headless: one label per bus and bucket (the clean sample has 3 buses and 13 buckets),
# one 4 x 6 in label per page by default, four 4 x 5 in labels per letter sheet with letter-4;
# a bad stock or date exits 2 and writes nothing.
file(REMOVE_RECURSE ${OUT}/labels)
execute_process(COMMAND ${CLI} labels ${SAMPLES}/kestrel-mill-mcc1.lineward --out ${OUT}/labels/mill.pdf
                        --date 2026-12-03
                RESULT_VARIABLE rc OUTPUT_VARIABLE out ERROR_VARIABLE err)
if(NOT rc EQUAL 0 OR NOT EXISTS ${OUT}/labels/mill.pdf OR NOT out MATCHES "16 labels on 16 pages")
  message(FATAL_ERROR "labels failed (${rc}): ${out} ${err}")
endif()
execute_process(COMMAND pdfinfo ${OUT}/labels/mill.pdf OUTPUT_VARIABLE info RESULT_VARIABLE rc)
if(NOT rc EQUAL 0 OR NOT info MATCHES "Pages: +16\n" OR NOT info MATCHES "288 x 432 pts")
  message(FATAL_ERROR "the 4 x 6 in label PDF is not 16 pages of 288 x 432 pt:\n${info}")
endif()
execute_process(COMMAND pdftotext ${OUT}/labels/mill.pdf - OUTPUT_VARIABLE text)
if(NOT text MATCHES "2026-12-03" OR NOT text MATCHES "NEC 110.16\\(B\\)" OR NOT text MATCHES "does not[ \n]+replace")
  message(FATAL_ERROR "the labels lack the date, the service block or the caution:\n${text}")
endif()
execute_process(COMMAND ${CLI} labels ${SAMPLES}/kestrel-mill-mcc1-review.lineward --out ${OUT}/labels/review.pdf
                        --stock letter-4
                RESULT_VARIABLE rc OUTPUT_VARIABLE out ERROR_VARIABLE err)
execute_process(COMMAND pdfinfo ${OUT}/labels/review.pdf OUTPUT_VARIABLE info)
if(NOT rc EQUAL 0 OR NOT out MATCHES "16 labels on 4 pages" OR NOT info MATCHES "Pages: +4\n"
   OR NOT info MATCHES "612 x 792 pts")
  message(FATAL_ERROR "labels --stock letter-4 (${rc}): ${out} ${err}\n${info}")
endif()
execute_process(COMMAND ${CLI} labels ${SAMPLES}/kestrel-mill-mcc1.lineward --out ${OUT}/labels/x.pdf --stock a7 RESULT_VARIABLE rc)
if(NOT rc EQUAL 2 OR EXISTS ${OUT}/labels/x.pdf)
  message(FATAL_ERROR "a bad stock must exit 2 and write nothing, got ${rc}")
endif()
execute_process(COMMAND ${CLI} labels ${SAMPLES}/kestrel-mill-mcc1.lineward --out ${OUT}/labels/x.pdf --date 3.12.26 RESULT_VARIABLE rc ERROR_VARIABLE err)
if(NOT rc EQUAL 2 OR EXISTS ${OUT}/labels/x.pdf OR NOT err MATCHES "YYYY-MM-DD")
  message(FATAL_ERROR "a bad date must exit 2 and say why, got ${rc}: ${err}")
endif()
