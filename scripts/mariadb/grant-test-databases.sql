-- Lets the application user create the throwaway databases of the tests (catline_test, catline_e2e).
GRANT ALL PRIVILEGES ON `catline%`.* TO 'catline'@'%';
