# Runs lineward-cli as a user would and checks its exit codes: 0 clean, 1 findings, 2 unreadable.
function(expect_exit code)
  execute_process(COMMAND ${ARGN} RESULT_VARIABLE rc OUTPUT_VARIABLE out ERROR_VARIABLE err)
  if(NOT rc EQUAL code)
    message(FATAL_ERROR "expected exit ${code}, got ${rc}: ${ARGN}\n${out}\n${err}")
  endif()
  set(LAST_OUT "${out}" PARENT_SCOPE)
  set(LAST_ERR "${err}" PARENT_SCOPE)
endfunction()

expect_exit(0 ${CLI} check ${SAMPLES}/kestrel-mill-mcc1.lineward)
expect_exit(1 ${CLI} check ${SAMPLES}/kestrel-mill-mcc1-review.lineward)
expect_exit(1 ${CLI} check --json ${SAMPLES}/kestrel-mill-mcc1-review.lineward)
string(JSON nreports LENGTH "${LAST_OUT}" reports)
string(JSON nviol GET "${LAST_OUT}" reports 0 counts violation)
if(NOT nreports EQUAL 1 OR nviol LESS 1)
  message(FATAL_ERROR "--json output lacks the report or its violations:\n${LAST_OUT}")
endif()
# Both files at once: the worst result wins.
expect_exit(1 ${CLI} check ${SAMPLES}/kestrel-mill-mcc1.lineward ${SAMPLES}/kestrel-mill-mcc1-review.lineward)
# A caution threshold: the clean sample has no cautions either.
expect_exit(0 ${CLI} check --fail-on caution ${SAMPLES}/kestrel-mill-mcc1.lineward)
# Unreadable input: exit 2 with a located message on stderr.
file(WRITE ${CMAKE_CURRENT_BINARY_DIR}/broken.lineward "{\n  \"format\": \"lineward\",\n  \"version\": 1,\n  \"parts\": [ {\"id\": 1,\n")
expect_exit(2 ${CLI} check ${CMAKE_CURRENT_BINARY_DIR}/broken.lineward)
if(NOT LAST_ERR MATCHES "broken.lineward:5:1: ")
  message(FATAL_ERROR "message lacks file:line:column: ${LAST_ERR}")
endif()
expect_exit(2 ${CLI} check --fail-on nonsense ${SAMPLES}/kestrel-mill-mcc1.lineward)
