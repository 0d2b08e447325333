import { Result } from 'antd';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';

export function Component() {
  return <Result status="404" title="There is no page at this address" extra={<Link to={paths.home}>Go to the home page</Link>} />;
}
