# Regenerate a committed file into OUT with `PY GEN OUT` and fail when it
# differs from COMMITTED.
execute_process(COMMAND ${PY} ${GEN} ${OUT} RESULT_VARIABLE rc OUTPUT_QUIET)
if(NOT rc EQUAL 0)
  message(FATAL_ERROR "${GEN} failed")
endif()
execute_process(COMMAND ${CMAKE_COMMAND} -E compare_files ${OUT} ${COMMITTED} RESULT_VARIABLE diff)
if(NOT diff EQUAL 0)
  message(FATAL_ERROR "${COMMITTED} is stale: run ${PY} ${GEN}")
endif()
message(STATUS "${COMMITTED} is up to date")
