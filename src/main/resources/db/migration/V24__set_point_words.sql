-- The case form's field for the temperature the cooled part is held at was renamed from
-- objectTemperature to setPointTemperature; saved studies keep the form's query string, so rename it
-- there too, or a re-opened study would lose its set-point.
UPDATE selection_study
   SET case_query = REPLACE(case_query, 'objectTemperature=', 'setPointTemperature=')
 WHERE case_query LIKE '%objectTemperature=%';
